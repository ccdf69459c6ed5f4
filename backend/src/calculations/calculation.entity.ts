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
  type CalculationStatus,
  type SealDto,
} from '@tiermode/shared-types';
import { Project } from '../projects/project.entity';
import { User } from '../users/user.entity';
import { Attachment } from './attachment.entity';
import { ReviewComment } from './review-comment.entity';

@Entity({ tableName: 'calculations' })
export class Calculation {
  [OptionalProps]?:
    | 'revision'
    | 'displayUnits'
    | 'basis'
    | 'checks'
    | 'status'
    | 'analysis'
    | 'engineVersion'
    | 'analysedAt'
    | 'inputsChangedAt'
    | 'reviewer'
    | 'submittedAt'
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

  @Property({ type: DateTimeType, nullable: true })
  returnedAt: Date | null = null;

  @Property({ type: DateTimeType, nullable: true })
  lockedAt: Date | null = null;

  /** Set once, by the lock; never changed after. */
  @Property({ type: 'json', nullable: true })
  seal: SealDto | null = null;

  /** The locked revision this draft was revised from. */
  @ManyToOne(() => Calculation, { nullable: true })
  previousRevision: Calculation | null = null;

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
}
