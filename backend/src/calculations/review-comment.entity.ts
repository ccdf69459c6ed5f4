import { randomUUID } from 'node:crypto';
import {
  DateTimeType,
  Entity,
  ManyToOne,
  OptionalProps,
  PrimaryKey,
  Property,
} from '@mikro-orm/core';
import { User } from '../users/user.entity';
import { Calculation } from './calculation.entity';

/** A reviewer's comment on a calculation (a return always carries one). */
@Entity({ tableName: 'review_comments' })
export class ReviewComment {
  [OptionalProps]?: 'target' | 'storey' | 'parent' | 'resolved' | 'createdAt';

  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @ManyToOne(() => Calculation)
  calculation!: Calculation;

  @ManyToOne(() => User)
  author!: User;

  @Property({ type: 'text' })
  body!: string;

  /** What it is about, e.g. "storey 3" or "CQC base shear"; null for the whole calc. */
  @Property({ type: 'string', length: 200, nullable: true })
  target: string | null = null;

  /** The storey (1 = the base) the comment is about, marked on that storey's row; or null. */
  @Property({ type: 'integer', nullable: true })
  storey: number | null = null;

  /** The comment this one answers; replies to a reply answer its first comment. */
  @ManyToOne(() => ReviewComment, { nullable: true, deleteRule: 'cascade' })
  parent: ReviewComment | null = null;

  @Property({ type: 'boolean' })
  resolved: boolean = false;

  @Property({ type: DateTimeType })
  createdAt: Date = new Date();
}
