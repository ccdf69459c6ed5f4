import { ForbiddenError, subject } from '@casl/ability';
import {
  EntityManager,
  LockMode,
  OptimisticLockError,
  UniqueConstraintViolationException,
} from '@mikro-orm/knex';
import {
  BadRequestException,
  ConflictException,
  ForbiddenException,
  Injectable,
  NotFoundException,
} from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { isLicensed } from '../authorization/licence';
import type { AppEnvironment } from '../config/environment';
import {
  changeNames,
  inputChanges,
  modalDetailOf,
  type ModalDetail,
  type ResponseHistoryResult,
  type WholeCalculationDto,
  type AnalysisRequest,
  type AnalysisResponse,
  type CalculationChanges,
  type CalculationDto,
  type CalculationInputs,
  type Action,
  type CalculationStatus,
  type CreateCommentRequest,
  type SealCheckResponse,
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
import { sealedContentOf } from './lock';
import { sealHash } from './seal';
import { SigningKey } from '../signing/signing-key';
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
  'nextRevisions',
] as const;

/** Comments may be written while a calc is a draft or under review. */
const OPEN_FOR_COMMENTS: CalculationStatus[] = ['draft', 'submitted'];
/** What a designer does to a calc: a reviewer who did any of it is not independent of it. */
const DESIGN_ACTIONS = [
  'created',
  'edited',
  'analysed',
  'submitted',
  'revised',
  'attached',
  'imported',
];

/**
 * For AuditService.commit: inside the write's transaction, the calc's stored status must still
 * be one of `allowed`, or nothing is written (409). A comment sent as the calc is locked is so
 * either stored before the lock or refused, in this process or another.
 */
export function stillIn(calc: Calculation, allowed: CalculationStatus[]) {
  return async (em: EntityManager): Promise<void> => {
    // A write that changes nothing but takes SQLite's write lock and tells whether the status
    // still allows the change. (em.nativeUpdate would also bump the calc's version, and so turn
    // every comment into a conflict for whoever is editing the calc.)
    const placeholders = allowed.map(() => '?').join(', ');
    const result = await em
      .getConnection()
      .execute<{ affectedRows: number }>(
        `update calculations set status = status where id = ? and status in (${placeholders})`,
        [calc.id, ...allowed],
        'run',
        em.getTransactionContext(),
      );
    const touched = result.affectedRows;
    if (touched === 0) {
      const now = await em.findOne(Calculation, { id: calc.id }, { refresh: true });
      throw new ConflictException(
        `This calculation became ${now?.status ?? 'unavailable'} while your change was on its way; nothing of yours was saved`,
      );
    }
  };
}

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
    private readonly key: SigningKey,
    private readonly config: ConfigService<AppEnvironment, true>,
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
    const history = body.history ? (plainInputs(body.history as never) as never) : null;
    if (history) this.analysis.validateHistory(history, inputs.storeys.length);
    const calc = this.em.create(Calculation, {
      project,
      title: body.title,
      inputs,
      history,
      displayUnits: body.displayUnits ?? 'SI',
      author,
    });
    await this.audit.commit(this.em, { calculationId: calc.id, actor: author, action: 'created' });
    return toCalculationDto(calc);
  }

  async get(ability: AppAbility, id: string): Promise<CalculationDto> {
    const calc = await this.loadReadable(ability, id);
    return toCalculationDto(calc);
  }

  /** The calc with its whole stored analysis (exports, the calc package, `?detail=full`). */
  async getWhole(ability: AppAbility, id: string): Promise<WholeCalculationDto> {
    const calc = await this.loadReadable(ability, id);
    return {
      ...toCalculationDto(calc),
      analysis: calc.analysis,
      historyResults: calc.historyResults,
    };
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
    const before = {
      inputs: calc.inputs,
      basis: calc.basis,
      title: calc.title,
      history: calc.history,
    };
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
    if (body.history !== undefined) {
      calc.history = body.history === null ? null : (plainInputs(body.history as never) as never);
      // A new record or scaling means a new response history: stale until analysed again.
      calc.inputsChangedAt = new Date();
      if (calc.history) this.analysis.validateHistory(calc.history, calc.inputs.storeys.length);
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
        history:
          body.history === undefined
            ? null
            : body.history === null
              ? 'removed'
              : body.history.record.name,
        // What changed, in a few words each: "storey 2 mass", "spectrum points", "basis sds".
        changes: [
          ...(before.title !== calc.title ? ['title'] : []),
          ...changeNames(
            inputChanges(before, { inputs: calc.inputs, basis: calc.basis, history: calc.history }),
          ),
        ],
      },
    });
    return toCalculationDto(calc);
  }

  /** Runs the engine on the stored inputs and keeps the result with the engine version. */
  async analyse(ability: AppAbility, actor: User, id: string): Promise<AnalysisResponse> {
    const calc = await this.loadForWrite(ability, id, 'analyse');
    // With a code basis, the checks are made from the same analysis and stored beside it; with
    // a record, its response history. A change made meanwhile (a lock, say) fails the flush's
    // version check: the analysis is not stored over it.
    const {
      analysis: result,
      checks,
      historyResults,
    } = await this.analysis.calcResults(calc.inputs, calc.basis, calc.history);
    calc.historyResults = historyResults;
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

  /** What the calc's summary leaves out of its stored analysis (per-mode responses, rho). */
  async modalDetail(ability: AppAbility, id: string): Promise<ModalDetail> {
    const calc = await this.loadReadable(ability, id);
    if (!calc.analysis) throw new NotFoundException('This calculation has not been analysed yet');
    return modalDetailOf(calc.analysis);
  }

  /** The response history kept with the calc (most of a calc's size, so not in its DTO). */
  async historyResults(ability: AppAbility, id: string): Promise<ResponseHistoryResult> {
    const calc = await this.loadReadable(ability, id);
    if (!calc.historyResults) {
      throw new NotFoundException('This calculation keeps no response history results');
    }
    return calc.historyResults;
  }

  /** Designer: send a draft whose stored analysis matches its inputs to review. */
  async submit(ability: AppAbility, actor: User, id: string): Promise<CalculationDto> {
    const calc = await this.loadForWrite(ability, id, 'submit');
    calc.submit(new Date());
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
    const calc = await this.loadFor(ability, id, 'return');
    calc.returnToDesigner(reviewer, new Date());
    // The mail carries every open comment (the return's own first) and a link to the review.
    const open = [
      `- ${comment} (${reviewer.name})`,
      ...calc.comments
        .getItems()
        .filter((c) => !c.resolved && c.parent === null)
        .map((c) => `- ${c.target ? `On ${c.target}: ` : ''}${c.body} (${c.author.name})`),
    ];
    this.em.create(ReviewComment, { calculation: calc, author: reviewer, body: comment });
    const link = `${this.config.get('publicUrl', { infer: true })}/calculations/${calc.id}?tab=review`;
    this.mail.queue(this.em, {
      to: [calc.author.email],
      subject: `Returned with comments: ${calc.title} (revision ${calc.revision})`,
      text:
        `${reviewer.name} returned "${calc.title}", revision ${calc.revision}, to you as a draft.\n\n` +
        `Open comments (${open.length}):\n${open.join('\n')}\n\n` +
        `Open the calc: ${link}`,
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
    const calc = await this.loadFor(ability, id, 'lock');
    if (!isLicensed(reviewer)) {
      throw new ForbiddenException('Only a reviewer with a current licence may lock a calculation');
    }
    await this.assertIndependent(reviewer, calc);
    const seal = calc.lock(reviewer, statement, new Date(), this.key);
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
    const calc = await this.loadFor(ability, id, 'revise', (c) => c.assertRevisable());
    const existing = `Revision ${calc.revision + 1} of this calculation already exists`;
    if (await this.em.findOne(Calculation, { previousRevision: calc })) {
      throw new ConflictException(existing);
    }
    const draft = calc.revise(author);
    this.em.persist(draft);
    try {
      await this.audit.commit(this.em, {
        calculationId: draft.id,
        actor: author,
        action: 'revised',
        detail: { from: calc.id, revision: draft.revision },
      });
    } catch (error) {
      // Two revise requests at once: the unique index on previous_revision_id keeps one.
      if (
        error instanceof UniqueConstraintViolationException &&
        /previous_revision_id/.test(error.message)
      ) {
        throw new ConflictException(existing);
      }
      throw error;
    }
    return toCalculationDto(await this.load(draft.id));
  }

  /**
   * Author: deletes a scratch draft (never submitted) with its comments and attachments; the
   * audit trail keeps its events and records the deletion. Returns the stored names of the
   * attachment files, for the caller to remove once the deletion is committed.
   */
  async remove(ability: AppAbility, actor: User, id: string): Promise<string[]> {
    const calc = await this.loadFor(ability, id, 'delete', (c) => c.assertDeletable());
    const files = calc.attachments.getItems().map((a) => a.storedName);
    const detail = {
      title: calc.title,
      revision: calc.revision,
      attachments: calc.attachments
        .getItems()
        .map((a) => ({ fileName: a.fileName, sha256: a.sha256 })),
    };
    this.em.remove([...calc.comments.getItems(), ...calc.attachments.getItems(), calc]);
    await this.audit.commit(
      this.em,
      { calculationId: calc.id, actor, action: 'deleted', detail },
      stillIn(calc, ['draft']),
    );
    return files;
  }

  /**
   * A comment on a calc that is not yet of record, tied to a storey or result when given, or a
   * reply to another comment of the same calc (a reply to a reply answers its first comment).
   */
  async addComment(
    ability: AppAbility,
    author: User,
    id: string,
    request: CreateCommentRequest,
  ): Promise<CalculationDto> {
    const calc = await this.loadFor(ability, id, 'comment', (c) => c.assertNotOfRecord());
    const storeys = calc.inputs.storeys.length;
    if (request.storey !== undefined && request.storey > storeys) {
      throw new BadRequestException([
        `storey must be at most ${storeys} (this calc has ${storeys} storeys; 1 = the base)`,
      ]);
    }
    let parent: ReviewComment | null = null;
    if (request.parentId !== undefined) {
      const answered = calc.comments.getItems().find((c) => c.id === request.parentId);
      if (!answered) {
        throw new BadRequestException(['parentId must be the id of a comment on this calculation']);
      }
      parent = answered.parent ?? answered;
    }
    const storey = request.storey ?? parent?.storey ?? null;
    const target = request.target ?? (storey !== null ? `storey ${storey}` : null);
    const comment = this.em.create(ReviewComment, {
      calculation: calc,
      author,
      body: request.body,
      target,
      storey,
      parent,
    });
    await this.audit.commit(
      this.em,
      {
        calculationId: calc.id,
        actor: author,
        action: parent ? 'replied' : 'commented',
        detail: { commentId: comment.id, target, ...(parent ? { parentId: parent.id } : {}) },
      },
      stillIn(calc, OPEN_FOR_COMMENTS),
    );
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
    calc.assertNotOfRecord();
    const record = { id: comment.id, projectMemberIds: calculationSubject(calc).projectMemberIds };
    ForbiddenError.from(ability).throwUnlessCan('update', subject('ReviewComment', record));
    comment.resolved = resolved;
    await this.audit.commit(
      this.em,
      {
        calculationId: calc.id,
        actor,
        action: resolved ? 'comment resolved' : 'comment reopened',
        detail: { commentId },
      },
      stillIn(calc, OPEN_FOR_COMMENTS),
    );
    await this.em.populate(calc, ['comments.author'], { refresh: true });
    return toCalculationDto(calc);
  }

  /**
   * What changed since the submission the reviewer last returned (its inputs and basis as they
   * went to review) or since the revision the calc was made from: storey by storey, field by
   * field.
   */
  async changes(
    ability: AppAbility,
    id: string,
    since: 'submission' | 'revision',
  ): Promise<CalculationChanges> {
    const calc = await this.loadReadable(ability, id);
    const now = { inputs: calc.inputs, basis: calc.basis, history: calc.history };
    if (since === 'submission') {
      // The submission the reviewer returned; a first submission has none yet.
      if (!calc.returnedInputs) {
        throw new ConflictException(
          calc.returnedAt
            ? 'This calculation was returned before returned submissions were kept: nothing to compare with'
            : calc.submittedAt
              ? 'This calculation has not been returned by a reviewer yet: its first submission is the only one, nothing to compare with'
              : 'This calculation has not been submitted yet: nothing to compare with',
        );
      }
      return {
        since,
        baseline: {
          calculationId: calc.id,
          revision: calc.revision,
          at: calc.returnedAt?.toISOString() ?? null,
        },
        ...inputChanges(
          { inputs: calc.returnedInputs, basis: calc.returnedBasis, history: calc.returnedHistory },
          now,
        ),
      };
    }
    const previous = calc.previousRevision;
    if (!previous) {
      throw new ConflictException(
        'This is revision 1: there is no previous revision to compare with',
      );
    }
    return {
      since,
      baseline: {
        calculationId: previous.id,
        revision: previous.revision,
        at: previous.lockedAt?.toISOString() ?? null,
      },
      ...inputChanges(
        { inputs: previous.inputs, basis: previous.basis, history: previous.history },
        now,
      ),
    };
  }

  /** The audit trail of one calculation. */
  async history(ability: AppAbility, id: string) {
    const calc = await this.loadReadable(ability, id);
    return this.audit.historyOf(calc.id);
  }

  /** Recomputes the seal from what is stored: a changed row shows valid: false. */
  async checkSeal(ability: AppAbility, id: string): Promise<SealCheckResponse> {
    const calc = await this.loadReadable(ability, id);
    const { seal } = calc;
    if (!seal) throw new NotFoundException('This calculation is not locked, so it has no seal');
    const content = sealedContentOf(calc, seal);
    const recomputed = content ? sealHash(content) : '';
    const hashValid = recomputed === seal.hash;
    const signature = !seal.signature
      ? 'absent'
      : this.key.verify('seal', seal.hash, seal.signature)
        ? 'valid'
        : 'invalid';
    const lockEvent = await this.audit.lockEventStatus(calc.id, seal.hash);
    const problems = [
      ...(hashValid ? [] : ['What is stored no longer matches the sealed hash']),
      ...(signature === 'valid'
        ? []
        : [
            signature === 'absent'
              ? 'The seal carries no signature (made before seals were signed, or stripped)'
              : "The seal's signature does not verify with this server's key",
          ]),
      ...(lockEvent === 'valid'
        ? []
        : [
            lockEvent === 'missing'
              ? 'The audit trail holds no lock event for this calc'
              : 'The lock event on the audit trail was changed or names another seal',
          ]),
      ...(await this.supersessionProblems(calc)),
    ];
    return {
      valid: problems.length === 0,
      hash: seal.hash,
      recomputed,
      seal,
      hashValid,
      signature,
      lockEvent,
      problems,
    };
  }

  /** A superseded calc must have a next revision that was locked after it. */
  private async supersessionProblems(calc: Calculation): Promise<string[]> {
    if (calc.status !== 'superseded') return [];
    const next = await this.em.findOne(Calculation, { previousRevision: calc });
    return next && next.isOfRecord()
      ? []
      : ['It is marked superseded, but no later revision of it is locked'];
  }

  /**
   * Independence: a reviewer may not lock a calc whose any revision they wrote, edited,
   * analysed or submitted, as the audit trail records it (authorship alone once let a designer
   * who reworked another's calc, later made a reviewer, lock it).
   */
  private async assertIndependent(reviewer: User, calc: Calculation): Promise<void> {
    const chain: Calculation[] = [];
    for (let c: Calculation | null = calc; c;) {
      chain.push(c);
      c = c.previousRevision
        ? await this.em.findOne(
            Calculation,
            { id: c.previousRevision.id },
            { populate: ['author'] },
          )
        : null;
    }
    const authored = chain.some((c) => c.author.id === reviewer.id);
    const acted = await this.audit.hasActed(
      reviewer.id,
      chain.map((c) => c.id),
      DESIGN_ACTIONS,
    );
    if (authored || acted) {
      throw new ForbiddenException(
        'You wrote, edited, analysed or submitted a revision of this calculation, so you cannot lock it: the lock must come from an independent reviewer',
      );
    }
  }

  /** The calculation, where the caller may read it (403 otherwise, 404 when there is none). */
  private async loadReadable(ability: AppAbility, id: string): Promise<Calculation> {
    const calc = await this.load(id);
    ForbiddenError.from(ability).throwUnlessCan(
      'read',
      subject('Calculation', calculationSubject(calc)),
    );
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
  loadForWrite(
    ability: AppAbility,
    id: string,
    action: 'update' | 'analyse' | 'submit',
  ): Promise<Calculation> {
    return this.loadFor(ability, id, action, (calc) => calc.assertWritable());
  }

  /**
   * A calc the caller may read, whose status allows what is about to happen (`assertState`,
   * a 409) and which the caller may then do `action` to (a 403): in that order, so that a
   * change the status forbids says so whoever asks.
   */
  private async loadFor(
    ability: AppAbility,
    id: string,
    action: Action,
    assertState: (calc: Calculation) => void = () => undefined,
  ): Promise<Calculation> {
    const calc = await this.load(id);
    const record = subject('Calculation', calculationSubject(calc));
    ForbiddenError.from(ability).throwUnlessCan('read', record);
    assertState(calc);
    ForbiddenError.from(ability).throwUnlessCan(action, record);
    return calc;
  }
}
