import { randomUUID } from 'node:crypto';
import {
  Collection,
  DateTimeType,
  Entity,
  Enum,
  ManyToOne,
  OneToMany,
  OptionalProps,
  PrimaryKey,
  Property,
} from '@mikro-orm/core';
import {
  CALCULATION_STATUSES,
  type AnalysisResponse,
  type CalculationInputs,
  type ChecksResponse,
  type CodeBasisParameters,
  type DisplayUnits,
  type ResponseHistoryResult,
  type ResponseHistorySetup,
  type CalculationStatus,
  type SealDto,
} from '@tiermode/shared-types';
import { ConflictException } from '@nestjs/common';
import { Project } from '../projects/project.entity';
import { User } from '../users/user.entity';
import { Attachment } from './attachment.entity';
import { ReviewComment } from './review-comment.entity';
import type { SigningKey } from '../signing/signing-key';
import { sealOf } from './lock';

@Entity({ tableName: 'calculations' })
export class Calculation {
  [OptionalProps]?:
    | 'revision'
    | 'displayUnits'
    | 'basis'
    | 'checks'
    | 'history'
    | 'historyResults'
    | 'status'
    | 'analysis'
    | 'engineVersion'
    | 'analysedAt'
    | 'inputsChangedAt'
    | 'reviewer'
    | 'submittedAt'
    | 'returnedInputs'
    | 'returnedBasis'
    | 'returnedHistory'
    | 'returnedAt'
    | 'lockedAt'
    | 'seal'
    | 'previousRevision'
    | 'createdAt'
    | 'updatedAt'
    | 'version';

  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @ManyToOne(() => Project)
  project!: Project;

  @Property({ type: 'string', length: 200 })
  title!: string;

  @Property({ type: 'integer' })
  revision: number = 1;

  @Enum({ items: () => [...CALCULATION_STATUSES], type: 'string' })
  status: CalculationStatus = 'draft';

  /** Storeys, spectrum, damping and mode selection, in SI base units. */
  @Property({ type: 'json' })
  inputs!: CalculationInputs;

  /** The code basis and its parameters (an input: sealed with the calc when set). */
  @Property({ type: 'json', nullable: true })
  basis: CodeBasisParameters | null = null;

  /** The checks made with the stored analysis, by the same engine version (sealed with it). */
  @Property({ type: 'json', nullable: true })
  checks: ChecksResponse | null = null;

  /** The response history's record and setup (an input: sealed with the calc when set). */
  @Property({ type: 'json', nullable: true })
  history: ResponseHistorySetup | null = null;

  /** The response history made with the stored analysis, by the same engine (sealed with it). */
  @Property({ type: 'json', nullable: true })
  historyResults: ResponseHistoryResult | null = null;

  /** How the calc is shown (values are SI whatever this says); not sealed, it changes no number. */
  @Property({ type: 'string', length: 2, default: 'SI' })
  displayUnits: DisplayUnits = 'SI';

  /** The engine's result for the inputs as they were at `analysedAt`. */
  @Property({ type: 'json', nullable: true })
  analysis: AnalysisResponse | null = null;

  @Property({ type: 'string', length: 20, nullable: true })
  engineVersion: string | null = null;

  @Property({ type: DateTimeType, nullable: true })
  analysedAt: Date | null = null;

  @Property({ type: DateTimeType })
  inputsChangedAt: Date = new Date();

  @ManyToOne(() => User)
  author!: User;

  /** The reviewer who last returned or locked it. */
  @ManyToOne(() => User, { nullable: true })
  reviewer: User | null = null;

  @Property({ type: DateTimeType, nullable: true })
  submittedAt: Date | null = null;

  /**
   * The inputs and basis of the submission the reviewer last returned (a submitted calc cannot
   * change, so they are what was submitted): what the designer's edits and the resubmission are
   * compared with.
   */
  @Property({ type: 'json', nullable: true })
  returnedInputs: CalculationInputs | null = null;

  @Property({ type: 'json', nullable: true })
  returnedBasis: CodeBasisParameters | null = null;

  @Property({ type: 'json', nullable: true })
  returnedHistory: ResponseHistorySetup | null = null;

  @Property({ type: DateTimeType, nullable: true })
  returnedAt: Date | null = null;

  @Property({ type: DateTimeType, nullable: true })
  lockedAt: Date | null = null;

  /** Set once, by the lock; never changed after. */
  @Property({ type: 'json', nullable: true })
  seal: SealDto | null = null;

  /**
   * The locked revision this draft was revised from. Unique: a calc has at most one next
   * revision, however many revise requests arrive at once (the database refuses a second).
   */
  @ManyToOne(() => Calculation, { nullable: true, unique: true })
  previousRevision: Calculation | null = null;

  /** The revision made from this one: none or one (the unique index above). */
  @OneToMany(() => Calculation, (c) => c.previousRevision)
  nextRevisions = new Collection<Calculation>(this);

  @OneToMany(() => ReviewComment, (comment) => comment.calculation, {
    orderBy: { createdAt: 'asc' },
  })
  comments = new Collection<ReviewComment>(this);

  @OneToMany(() => Attachment, (a) => a.calculation, { orderBy: { uploadedAt: 'asc' } })
  attachments = new Collection<Attachment>(this);

  @Property({ type: DateTimeType })
  createdAt: Date = new Date();

  @Property({ type: DateTimeType, onUpdate: () => new Date() })
  updatedAt: Date = new Date();

  @Property({ type: 'integer', version: true })
  version!: number;

  // The workflow: every change of status happens in one of these methods, which refuse (409) a
  // change the current status does not allow. The services check who may act (CASL, licence,
  // independence); the flush's version check makes two changes at once end in one 409.

  /** Locked or superseded: a calc of record, which never changes again. */
  isOfRecord(): boolean {
    return this.status === 'locked' || this.status === 'superseded';
  }

  /** Comments may be added and resolved until the calc is of record. */
  assertNotOfRecord(): void {
    if (this.isOfRecord())
      throw new ConflictException(`${this.sealedPhrase()} and can never change`);
  }

  /** Inputs, analysis, attachments and submission change only while the calc is a draft. */
  assertWritable(): void {
    if (this.isOfRecord()) {
      throw new ConflictException(
        `${this.sealedPhrase()} and can never change; revise it to start a new draft`,
      );
    }
    if (this.status === 'submitted') {
      throw new ConflictException(
        'This calculation is submitted for review; it can change again once the reviewer returns it',
      );
    }
  }

  /** Designer: a draft whose stored analysis matches its inputs goes to review. */
  submit(at: Date): void {
    this.assertWritable();
    if (!this.analysis || !this.analysedAt || this.analysedAt < this.inputsChangedAt) {
      throw new ConflictException(
        'Analyse the current inputs before submitting: the stored analysis is missing or older than the inputs',
      );
    }
    this.status = 'submitted';
    this.submittedAt = at;
  }

  /** Reviewer: a submitted calc goes back to its designers as a draft. */
  returnToDesigner(reviewer: User, at: Date): void {
    this.assertSubmitted('returned');
    this.status = 'draft';
    this.returnedAt = at;
    this.returnedInputs = structuredClone(this.inputs);
    this.returnedBasis = this.basis ? structuredClone(this.basis) : null;
    this.returnedHistory = this.history ? structuredClone(this.history) : null;
    this.reviewer = reviewer;
  }

  /**
   * Licensed, independent reviewer: seals a submitted calc as the calc of record, and
   * supersedes the locked revision it came from (loaded in `previousRevision`).
   */
  lock(reviewer: User, statement: string, at: Date, key: SigningKey): SealDto {
    this.assertSubmitted('locked');
    const seal = sealOf(this, reviewer, statement, at, key);
    this.seal = seal;
    this.status = 'locked';
    this.lockedAt = at;
    this.reviewer = reviewer;
    if (this.previousRevision?.status === 'locked') this.previousRevision.status = 'superseded';
    return seal;
  }

  /** Designer: the next revision of a locked calc, as a new draft with its inputs. */
  revise(author: User): Calculation {
    this.assertRevisable();
    const next = new Calculation();
    next.project = this.project;
    next.title = this.title;
    next.revision = this.revision + 1;
    next.inputs = structuredClone(this.inputs);
    next.displayUnits = this.displayUnits;
    next.basis = this.basis ? structuredClone(this.basis) : null;
    next.history = this.history ? structuredClone(this.history) : null;
    next.author = author;
    next.previousRevision = this;
    return next;
  }

  /** A scratch draft, never submitted, may be deleted; one that went to review is kept. */
  assertDeletable(): void {
    this.assertWritable();
    if (this.submittedAt !== null) {
      throw new ConflictException(
        'This draft went to review once, so it is kept with its review; only a draft never submitted can be deleted',
      );
    }
  }

  /** Only the locked revision (the current calc of record) has a next revision. */
  assertRevisable(): void {
    if (this.status !== 'locked') {
      throw new ConflictException(
        `Only a locked calculation can be revised; this one is ${this.status}`,
      );
    }
  }

  private assertSubmitted(action: 'locked' | 'returned'): void {
    this.assertNotOfRecord();
    if (this.status !== 'submitted') {
      throw new ConflictException(
        `Only a submitted calculation can be ${action}; this one is ${this.status}`,
      );
    }
  }

  private sealedPhrase(): string {
    return `This calculation is ${this.status} (sealed ${this.seal?.hash.slice(0, 12) ?? ''}…)`;
  }
}
