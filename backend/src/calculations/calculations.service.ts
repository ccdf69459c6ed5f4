import { ForbiddenError, subject } from '@casl/ability';
import { EntityManager, LockMode, OptimisticLockError } from '@mikro-orm/sqlite';
import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { isLicensed } from '../authorization/licence';
import type {
  AnalysisRequest,
  AnalysisResponse,
  CalculationDto,
  CalculationInputs,
  SealCheckResponse,
} from '@tiermode/shared-types';
import { AnalysisService } from '../analysis/analysis.service';
import { AuditService } from '../audit/audit.service';
import { MailService } from '../mail/mail.service';
import { accessibleWhere } from '../authorization/accessible-where';
import type { AppAbility } from '../authorization/app-ability';
import { Project } from '../projects/project.entity';
import { projectSubject } from '../projects/project.mapper';
import { User } from '../users/user.entity';
import { ReviewComment } from './review-comment.entity';
import { applyLock, sealedContentOf } from './lock';
import { sealHash } from './seal';
import { Calculation } from './calculation.entity';
import { calculationSubject, toCalculationDto } from './calculation.mapper';
import type { CreateCalculationDto, UpdateCalculationDto } from './dto/calculation.dto';

const POPULATE = [
  'project.members',
  'author',
  'reviewer',
  'comments.author',
  'attachments.uploadedBy',
  'previousRevision',
] as const;

/** The inputs as plain JSON, whatever class instances validation made of them. */
function plainInputs(inputs: AnalysisRequest): CalculationInputs {
  return JSON.parse(JSON.stringify(inputs)) as CalculationInputs;
}

@Injectable()
export class CalculationsService {
  constructor(
    private readonly em: EntityManager,
    private readonly analysis: AnalysisService,
    private readonly audit: AuditService,
    private readonly mail: MailService,
  ) {}

  async listForProject(ability: AppAbility, projectId: string): Promise<CalculationDto[]> {
    const project = await this.em.findOne(Project, { id: projectId }, { populate: ['members'] });
    if (!project) throw new NotFoundException(`No project with id ${projectId}`);
    ForbiddenError.from(ability).throwUnlessCan(
      'read',
      subject('Project', projectSubject(project)),
    );
    const where = accessibleWhere(ability, 'read', 'Calculation');
    if (where === null) return [];
    const calcs = await this.em.find(
      Calculation,
      { $and: [{ project }, where] },
      { populate: POPULATE, orderBy: { title: 'asc', revision: 'desc' } },
    );
    return calcs
      .filter((c) => ability.can('read', subject('Calculation', calculationSubject(c))))
      .map(toCalculationDto);
  }

  async create(
    ability: AppAbility,
    author: User,
    projectId: string,
    body: CreateCalculationDto,
  ): Promise<CalculationDto> {
    const project = await this.em.findOne(Project, { id: projectId }, { populate: ['members'] });
    if (!project) throw new NotFoundException(`No project with id ${projectId}`);
    ForbiddenError.from(ability).throwUnlessCan(
      'create',
      subject('Calculation', {
        id: '',
        status: 'draft',
        authorId: author.id,
        projectMemberIds: projectSubject(project).memberIds,
      }),
    );
    const inputs = plainInputs(body.inputs);
    this.analysis.validate(inputs, 'inputs.');
    const calc = this.em.create(Calculation, {
      project,
      title: body.title,
      inputs,
      displayUnits: body.displayUnits ?? 'SI',
      author,
    });
    await this.audit.commit(this.em, { calculationId: calc.id, actor: author, action: 'created' });
    return toCalculationDto(calc);
  }

  async get(ability: AppAbility, id: string): Promise<CalculationDto> {
    const calc = await this.load(id);
    ForbiddenError.from(ability).throwUnlessCan(
      'read',
      subject('Calculation', calculationSubject(calc)),
    );
    return toCalculationDto(calc);
  }

  async update(
    ability: AppAbility,
    actor: User,
    id: string,
    body: UpdateCalculationDto,
  ): Promise<CalculationDto> {
    const calc = await this.loadForWrite(ability, id, 'update');
    try {
      await this.em.lock(calc, LockMode.OPTIMISTIC, body.version);
    } catch (error) {
      if (error instanceof OptimisticLockError) {
        throw new ConflictException(
          `This calculation was changed by someone else (version ${calc.version}, yours ${body.version}); reload and try again`,
        );
      }
      throw error;
    }
    if (body.title !== undefined) calc.title = body.title;
    // Display units change how values are shown, not what they are: the results stay current.
    if (body.displayUnits !== undefined) calc.displayUnits = body.displayUnits;
    if (body.basis !== undefined) {
      calc.basis = body.basis === null ? null : (plainInputs(body.basis as never) as never);
      // A new basis means new checks: the stored results are stale until analysed again.
      calc.inputsChangedAt = new Date();
    }
    if (body.inputs !== undefined) {
      const inputs = plainInputs(body.inputs);
      this.analysis.validate(inputs, 'inputs.');
      calc.inputs = inputs;
      calc.inputsChangedAt = new Date();
    }
    await this.audit.commit(this.em, {
      calculationId: calc.id,
      actor,
      action: 'edited',
      detail: {
        title: body.title !== undefined,
        inputs: body.inputs !== undefined,
        displayUnits: body.displayUnits ?? null,
        basis: body.basis === undefined ? null : (body.basis?.code ?? 'removed'),
      },
    });
    return toCalculationDto(calc);
  }

  /** Runs the engine on the stored inputs and keeps the result with the engine version. */
  async analyse(ability: AppAbility, actor: User, id: string): Promise<AnalysisResponse> {
    const calc = await this.loadForWrite(ability, id, 'analyse');
    // With a code basis, the checks are made from the same analysis and stored beside it.
    const { analysis: result, checks } = calc.basis
      ? this.analysis.analyseAndCheck({ ...calc.inputs, basis: calc.basis })
      : { analysis: this.analysis.analyse(calc.inputs), checks: null };
    calc.analysis = result;
    calc.checks = checks;
    calc.engineVersion = result.engineVersion;
    calc.analysedAt = new Date();
    await this.audit.commit(this.em, {
      calculationId: calc.id,
      actor,
      action: 'analysed',
      detail: { engineVersion: result.engineVersion, cqcBaseShear: result.combined.cqc.baseShear },
    });
    return result;
  }

  /** Designer: send a draft whose stored analysis matches its inputs to review. */
  async submit(ability: AppAbility, actor: User, id: string): Promise<CalculationDto> {
    const calc = await this.loadForWrite(ability, id, 'submit');
    if (!calc.analysis || !calc.analysedAt || calc.analysedAt < calc.inputsChangedAt) {
      throw new ConflictException(
        'Analyse the current inputs before submitting: the stored analysis is missing or older than the inputs',
      );
    }
    calc.status = 'submitted';
    calc.submittedAt = new Date();
    const reviewers = await this.em.find(User, { role: 'reviewer', active: true });
    this.mail.queue(this.em, {
      to: reviewers.map((r) => r.email),
      subject: `Submitted for review: ${calc.title} (revision ${calc.revision})`,
      text: `${actor.name} submitted "${calc.title}", revision ${calc.revision}, in the project ${calc.project.name} for review.`,
    });
    await this.audit.commit(this.em, { calculationId: calc.id, actor, action: 'submitted' });
    this.mail.kick();
    return toCalculationDto(calc);
  }

  /** Reviewer: send a submitted calc back to its designers as a draft, with a comment. */
  async returnToDesigner(
    ability: AppAbility,
    reviewer: User,
    id: string,
    comment: string,
  ): Promise<CalculationDto> {
    const calc = await this.loadSubmitted(ability, id, 'return');
    this.em.create(ReviewComment, { calculation: calc, author: reviewer, body: comment });
    calc.status = 'draft';
    calc.returnedAt = new Date();
    calc.reviewer = reviewer;
    this.mail.queue(this.em, {
      to: [calc.author.email],
      subject: `Returned with comments: ${calc.title} (revision ${calc.revision})`,
      text: `${reviewer.name} returned "${calc.title}", revision ${calc.revision}, to you as a draft:\n\n${comment}`,
    });
    await this.audit.commit(this.em, {
      calculationId: calc.id,
      actor: reviewer,
      action: 'returned',
      detail: { comment },
    });
    this.mail.kick();
    await this.em.populate(calc, ['comments.author'], { refresh: true });
    return toCalculationDto(calc);
  }

  /**
   * Licensed reviewer, not the author: accept a submitted calc as the calc of record. The seal
   * hashes the inputs, the stored analysis, the engine version, the reviewer's name and licence,
   * the statement and the time. An older locked revision becomes superseded.
   */
  async lock(
    ability: AppAbility,
    reviewer: User,
    id: string,
    statement: string,
  ): Promise<CalculationDto> {
    const calc = await this.loadSubmitted(ability, id, 'lock');
    if (!calc.analysis || !calc.engineVersion || !isLicensed(reviewer)) {
      throw new ConflictException('This calculation cannot be locked: it has no stored analysis');
    }
    const seal = applyLock(calc, reviewer, statement, new Date());
    const previous = calc.previousRevision;
    this.mail.queue(this.em, {
      to: [calc.author.email],
      subject: `Locked as the calc of record: ${calc.title} (revision ${calc.revision})`,
      text: `${reviewer.name} (licence ${seal.licenseNumber}, ${seal.licenseJurisdiction}) locked "${calc.title}", revision ${calc.revision}.\n\nStatement: ${statement}\nSeal: ${seal.hash}`,
    });
    await this.audit.commit(this.em, {
      calculationId: calc.id,
      actor: reviewer,
      action: 'locked',
      detail: { sealHash: seal.hash, supersedes: previous?.id ?? null },
    });
    this.mail.kick();
    return toCalculationDto(calc);
  }

  /** Designer: start the next revision of a locked calc as a new draft with its inputs. */
  async revise(ability: AppAbility, author: User, id: string): Promise<CalculationDto> {
    const calc = await this.load(id);
    ForbiddenError.from(ability).throwUnlessCan(
      'read',
      subject('Calculation', calculationSubject(calc)),
    );
    if (calc.status !== 'locked') {
      throw new ConflictException(
        `Only a locked calculation can be revised; this one is ${calc.status}`,
      );
    }
    ForbiddenError.from(ability).throwUnlessCan(
      'revise',
      subject('Calculation', calculationSubject(calc)),
    );
    const next = await this.em.findOne(Calculation, { previousRevision: calc });
    if (next) {
      throw new ConflictException(`Revision ${next.revision} of this calculation already exists`);
    }
    const draft = this.em.create(Calculation, {
      project: calc.project,
      title: calc.title,
      revision: calc.revision + 1,
      inputs: structuredClone(calc.inputs),
      displayUnits: calc.displayUnits,
      basis: calc.basis ? structuredClone(calc.basis) : null,
      author,
      previousRevision: calc,
    });
    await this.audit.commit(this.em, {
      calculationId: draft.id,
      actor: author,
      action: 'revised',
      detail: { from: calc.id, revision: draft.revision },
    });
    return toCalculationDto(await this.load(draft.id));
  }

  /** A comment on a calc that is not yet of record, tied to a storey or result when given. */
  async addComment(
    ability: AppAbility,
    author: User,
    id: string,
    body: string,
    target: string | null,
  ): Promise<CalculationDto> {
    const calc = await this.load(id);
    ForbiddenError.from(ability).throwUnlessCan(
      'read',
      subject('Calculation', calculationSubject(calc)),
    );
    this.assertNotOfRecord(calc);
    ForbiddenError.from(ability).throwUnlessCan(
      'comment',
      subject('Calculation', calculationSubject(calc)),
    );
    const comment = this.em.create(ReviewComment, { calculation: calc, author, body, target });
    await this.audit.commit(this.em, {
      calculationId: calc.id,
      actor: author,
      action: 'commented',
      detail: { commentId: comment.id, target },
    });
    await this.em.populate(calc, ['comments.author'], { refresh: true });
    return toCalculationDto(calc);
  }

  /** Marks a comment resolved (or open again). */
  async resolveComment(
    ability: AppAbility,
    actor: User,
    commentId: string,
    resolved: boolean,
  ): Promise<CalculationDto> {
    const comment = await this.em.findOne(ReviewComment, { id: commentId });
    if (!comment) throw new NotFoundException(`No comment with id ${commentId}`);
    const calc = await this.load(comment.calculation.id);
    ForbiddenError.from(ability).throwUnlessCan(
      'read',
      subject('Calculation', calculationSubject(calc)),
    );
    this.assertNotOfRecord(calc);
    const record = { id: comment.id, projectMemberIds: calculationSubject(calc).projectMemberIds };
    ForbiddenError.from(ability).throwUnlessCan('update', subject('ReviewComment', record));
    comment.resolved = resolved;
    await this.audit.commit(this.em, {
      calculationId: calc.id,
      actor,
      action: resolved ? 'comment resolved' : 'comment reopened',
      detail: { commentId },
    });
    await this.em.populate(calc, ['comments.author'], { refresh: true });
    return toCalculationDto(calc);
  }

  private assertNotOfRecord(calc: Calculation): void {
    if (calc.status === 'locked' || calc.status === 'superseded') {
      throw new ConflictException(
        `This calculation is ${calc.status} (sealed ${calc.seal?.hash.slice(0, 12) ?? ''}…) and can never change`,
      );
    }
  }

  /** The audit trail of one calculation. */
  async history(ability: AppAbility, id: string) {
    const calc = await this.load(id);
    ForbiddenError.from(ability).throwUnlessCan(
      'read',
      subject('Calculation', calculationSubject(calc)),
    );
    return this.audit.historyOf(calc.id);
  }

  /** Recomputes the seal from what is stored: a changed row shows valid: false. */
  async checkSeal(ability: AppAbility, id: string): Promise<SealCheckResponse> {
    const calc = await this.load(id);
    ForbiddenError.from(ability).throwUnlessCan(
      'read',
      subject('Calculation', calculationSubject(calc)),
    );
    const { seal } = calc;
    if (!seal) throw new NotFoundException('This calculation is not locked, so it has no seal');
    const content = sealedContentOf(calc, seal);
    const recomputed = content ? sealHash(content) : '';
    return { valid: recomputed === seal.hash, hash: seal.hash, recomputed, seal };
  }

  private async loadSubmitted(
    ability: AppAbility,
    id: string,
    action: 'return' | 'lock',
  ): Promise<Calculation> {
    const calc = await this.load(id);
    ForbiddenError.from(ability).throwUnlessCan(
      'read',
      subject('Calculation', calculationSubject(calc)),
    );
    ForbiddenError.from(ability).throwUnlessCan(
      action,
      subject('Calculation', calculationSubject(calc)),
    );
    if (calc.status !== 'submitted') {
      throw new ConflictException(
        calc.status === 'locked' || calc.status === 'superseded'
          ? `This calculation is ${calc.status} (sealed ${calc.seal?.hash.slice(0, 12) ?? ''}…) and can never change`
          : `Only a submitted calculation can be ${action === 'lock' ? 'locked' : 'returned'}; this one is ${calc.status}`,
      );
    }
    return calc;
  }

  private async load(id: string): Promise<Calculation> {
    const calc = await this.em.findOne(Calculation, { id }, { populate: POPULATE });
    if (!calc) throw new NotFoundException(`No calculation with id ${id}`);
    return calc;
  }

  /**
   * A calculation about to be changed: one that is locked or superseded accepts no change (409),
   * one under review accepts none until it is returned (409); otherwise the ability decides.
   */
  async loadForWrite(
    ability: AppAbility,
    id: string,
    action: 'update' | 'analyse' | 'submit',
  ): Promise<Calculation> {
    const calc = await this.load(id);
    ForbiddenError.from(ability).throwUnlessCan(
      'read',
      subject('Calculation', calculationSubject(calc)),
    );
    if (calc.status === 'locked' || calc.status === 'superseded') {
      throw new ConflictException(
        `This calculation is ${calc.status} (sealed ${calc.seal?.hash.slice(0, 12) ?? ''}…) and can never change; revise it to start a new draft`,
      );
    }
    if (calc.status === 'submitted') {
      throw new ConflictException(
        'This calculation is submitted for review; it can change again once the reviewer returns it',
      );
    }
    ForbiddenError.from(ability).throwUnlessCan(
      action,
      subject('Calculation', calculationSubject(calc)),
    );
    return calc;
  }
}
