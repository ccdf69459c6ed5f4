import { createHash, randomUUID } from 'node:crypto';
import { mkdir, readFile, rm, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { ForbiddenError, subject } from '@casl/ability';
import { EntityManager } from '@mikro-orm/knex';
import {
  BadRequestException,
  ConflictException,
  ForbiddenException,
  Injectable,
  NotFoundException,
} from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { AttachmentDto, CalculationDto } from '@tiermode/shared-types';
import type { AppAbility } from '../authorization/app-ability';
import { AuditService } from '../audit/audit.service';
import type { AppEnvironment } from '../config/environment';
import { detectKind, polyglotProblem } from '../imports/file-checks';
import { pdfActiveContent } from '../imports/pdf-active-content';
import type { User } from '../users/user.entity';
import { Attachment } from './attachment.entity';
import type { Calculation } from './calculation.entity';
import { calculationSubject, toAttachmentDto } from './calculation.mapper';
import { CalculationsService, stillIn } from './calculations.service';

const KINDS = {
  pdf: { contentType: 'application/pdf', extension: 'pdf' },
  png: { contentType: 'image/png', extension: 'png' },
  jpeg: { contentType: 'image/jpeg', extension: 'jpg' },
} as const;

/** The uploaded name, for showing only: its last path part, printable, at most 200 characters. */
export function displayName(original: string): string {
  const last = original.split(/[\\/]/).pop() ?? '';
  // eslint-disable-next-line no-control-regex
  const printable = last.replace(/[\u0000-\u001f\u007f"<>|*?:]/g, '_').trim();
  return (printable || 'attachment').slice(-200);
}

/** Files kept with a calc; adding one is an edit of a draft, so a locked calc refuses it. */
@Injectable()
export class AttachmentsService {
  constructor(
    private readonly em: EntityManager,
    private readonly calculations: CalculationsService,
    private readonly audit: AuditService,
    private readonly config: ConfigService<AppEnvironment, true>,
  ) {}

  async add(
    ability: AppAbility,
    actor: User,
    calculationId: string,
    file: { buffer: Buffer; originalname: string },
  ): Promise<CalculationDto> {
    const calc = await this.calculations.loadForWrite(ability, calculationId, 'update');
    const kind = detectKind(file.buffer);
    if (kind !== 'pdf' && kind !== 'png' && kind !== 'jpeg') {
      throw new BadRequestException([
        `file must be a PDF, PNG or JPEG (judged by its content, not its name; this one is ${kind === 'xlsx' ? 'a ZIP archive' : kind === 'text' ? 'text' : 'none of them'})`,
      ]);
    }
    const problem =
      polyglotProblem(kind, file.buffer) ??
      (kind === 'pdf' ? await pdfActiveContent(file.buffer) : null);
    if (problem) throw new BadRequestException([`file ${problem}`]);
    const { contentType, extension } = KINDS[kind];
    const attachment = this.em.create(Attachment, {
      calculation: calc,
      fileName: displayName(file.originalname),
      storedName: '',
      contentType,
      size: file.buffer.length,
      sha256: createHash('sha256').update(file.buffer).digest('hex'),
      uploadedBy: actor,
    });
    attachment.storedName = `${randomUUID()}.${extension}`;
    const dir = this.config.get('attachmentsDir', { infer: true });
    await mkdir(dir, { recursive: true });
    // Written before the row is committed, under the server's own name: a failed commit leaves
    // an unreferenced file, never a row without its file.
    await writeFile(join(dir, attachment.storedName), file.buffer, { flag: 'wx' });
    calc.attachments.add(attachment);
    await this.commitChange(calc, actor, 'attached', attachment);
    return this.calculations.get(ability, calc.id);
  }

  /** The calc's author removes an attachment from a draft; the audit trail records it. */
  async remove(ability: AppAbility, actor: User, id: string): Promise<CalculationDto> {
    const found = await this.em.findOne(Attachment, { id }, { populate: ['calculation'] });
    if (!found) throw new NotFoundException(`No attachment with id ${id}`);
    const calc = await this.calculations.loadForWrite(ability, found.calculation.id, 'update');
    if (calc.author.id !== actor.id) {
      throw new ForbiddenException('Only the calc’s author may remove its attachments');
    }
    const attachment = calc.attachments.getItems().find((a) => a.id === id)!;
    this.em.remove(attachment);
    await this.commitChange(calc, actor, 'attachment removed', attachment);
    await this.removeFiles([attachment.storedName]);
    return this.calculations.get(ability, calc.id);
  }

  /**
   * Writes an attachment's change with its audit event. Attachments are sealed with the calc,
   * so the calc must still be a draft when the change is written (else 409, nothing written).
   */
  private commitChange(
    calc: Calculation,
    actor: User,
    action: 'attached' | 'attachment removed',
    attachment: Attachment,
  ): Promise<void> {
    return this.audit.commit(
      this.em,
      {
        calculationId: calc.id,
        actor,
        action,
        detail: { fileName: attachment.fileName, sha256: attachment.sha256 },
      },
      stillIn(calc, ['draft']),
    );
  }

  /** Removes stored files once their rows are gone; a file left behind is only unreferenced. */
  async removeFiles(storedNames: string[]): Promise<void> {
    const dir = this.config.get('attachmentsDir', { infer: true });
    await Promise.all(storedNames.map((name) => rm(join(dir, name), { force: true })));
  }

  async download(
    ability: AppAbility,
    id: string,
  ): Promise<{ attachment: AttachmentDto; bytes: Buffer }> {
    const attachment = await this.em.findOne(
      Attachment,
      { id },
      { populate: ['calculation.project.members', 'calculation.author', 'uploadedBy'] },
    );
    if (!attachment) throw new NotFoundException(`No attachment with id ${id}`);
    ForbiddenError.from(ability).throwUnlessCan(
      'read',
      subject('Calculation', calculationSubject(attachment.calculation)),
    );
    const bytes = await readFile(
      join(this.config.get('attachmentsDir', { infer: true }), attachment.storedName),
    );
    if (createHash('sha256').update(bytes).digest('hex') !== attachment.sha256) {
      throw new ConflictException(
        'The stored file no longer matches the SHA-256 recorded when it was attached; tell your admin',
      );
    }
    return { attachment: toAttachmentDto(attachment), bytes };
  }
}
