import { randomUUID } from 'node:crypto';
import {
  Collection,
  DateTimeType,
  Entity,
  ManyToMany,
  ManyToOne,
  OptionalProps,
  PrimaryKey,
  Property,
} from '@mikro-orm/core';
import type { CodeBasis } from '@tiermode/shared-types';
import { User } from '../users/user.entity';

@Entity({ tableName: 'projects' })
export class Project {
  [OptionalProps]?:
    'site' | 'codeBasis' | 'structuralSystem' | 'createdAt' | 'updatedAt' | 'version';

  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @Property({ type: 'string', length: 200 })
  name!: string;

  /** A description of the site (invented in the demo). */
  @Property({ type: 'string', length: 1000, nullable: true })
  site: string | null = null;

  /** The code the seismic design follows (CODE_BASES). */
  @Property({ type: 'string', length: 20, default: 'USER' })
  codeBasis: CodeBasis = 'USER';

  /** The lateral system in the engineer's words. */
  @Property({ type: 'string', length: 120, nullable: true })
  structuralSystem: string | null = null;

  @ManyToOne(() => User)
  createdBy!: User;

  /** Designers who may edit the project and its drafts. */
  @ManyToMany({ entity: () => User, pivotTable: 'project_members' })
  members = new Collection<User>(this);

  @Property({ type: DateTimeType })
  createdAt: Date = new Date();

  @Property({ type: DateTimeType, onUpdate: () => new Date() })
  updatedAt: Date = new Date();

  @Property({ type: 'integer', version: true })
  version!: number;
}
