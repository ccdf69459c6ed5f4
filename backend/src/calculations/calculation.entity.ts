import { randomUUID } from 'node:crypto';
import { Entity, Enum, ManyToOne, OptionalProps, PrimaryKey, Property } from '@mikro-orm/core';
import {
  CALCULATION_STATUSES,
  type AnalysisResponse,
  type CalculationInputs,
  type CalculationStatus,
} from '@tiermode/shared-types';
import { Project } from '../projects/project.entity';
import { User } from '../users/user.entity';

@Entity({ tableName: 'calculations' })
export class Calculation {
  [OptionalProps]?:
    | 'revision'
    | 'status'
    | 'analysis'
    | 'engineVersion'
    | 'analysedAt'
    | 'inputsChangedAt'
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

  /** The engine's result for the inputs as they were at `analysedAt`. */
  @Property({ type: 'json', nullable: true })
  analysis: AnalysisResponse | null = null;

  @Property({ type: 'string', length: 20, nullable: true })
  engineVersion: string | null = null;

  @Property({ type: 'datetime', nullable: true })
  analysedAt: Date | null = null;

  @Property({ type: 'datetime' })
  inputsChangedAt: Date = new Date();

  @ManyToOne(() => User)
  author!: User;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  @Property({ type: 'datetime', onUpdate: () => new Date() })
  updatedAt: Date = new Date();

  @Property({ type: 'integer', version: true })
  version!: number;
}
