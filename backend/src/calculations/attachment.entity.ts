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

/**
 * A file kept with a calc (a drawing, a geotechnical letter): stored under a name the server
 * makes, with its SHA-256, which the seal covers once the calc is locked.
 */
@Entity({ tableName: 'attachments' })
export class Attachment {
  [OptionalProps]?: 'uploadedAt';

  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @ManyToOne(() => Calculation)
  calculation!: Calculation;

  /** The name as uploaded, cleaned for showing; never used as a path. */
  @Property({ type: 'string', length: 200 })
  fileName!: string;

  /** The file's name on disk: the id and the extension of its detected type. */
  @Property({ type: 'string', length: 60 })
  storedName!: string;

  @Property({ type: 'string', length: 40 })
  contentType!: string;

  @Property({ type: 'integer' })
  size!: number;

  @Property({ type: 'string', length: 64 })
  sha256!: string;

  @ManyToOne(() => User)
  uploadedBy!: User;

  @Property({ type: DateTimeType })
  uploadedAt: Date = new Date();
}
