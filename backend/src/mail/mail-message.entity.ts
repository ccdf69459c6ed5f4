import { randomUUID } from 'node:crypto';
import { DateTimeType, Entity, Enum, OptionalProps, PrimaryKey, Property } from '@mikro-orm/core';

export const MAIL_STATUSES = ['received', 'queued', 'sent', 'failed'] as const;
export type MailStatus = (typeof MAIL_STATUSES)[number];

/**
 * A mail message: one Tiermode sends (queued, then sent or failed, with its attempts), or one
 * the local catcher received.
 */
@Entity({ tableName: 'mail_messages' })
export class MailMessage {
  [OptionalProps]?: 'attempts' | 'lastError' | 'createdAt' | 'sentAt' | 'claimedUntil';

  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @Enum({ items: () => [...MAIL_STATUSES], type: 'string' })
  status!: MailStatus;

  @Property({ type: 'string', length: 320 })
  from!: string;

  @Property({ type: 'string', length: 2000 })
  to!: string;

  @Property({ type: 'string', length: 500 })
  subject!: string;

  @Property({ type: 'text' })
  text!: string;

  @Property({ type: 'integer' })
  attempts: number = 0;

  @Property({ type: 'text', nullable: true })
  lastError: string | null = null;

  @Property({ type: DateTimeType })
  createdAt: Date = new Date();

  @Property({ type: DateTimeType, nullable: true })
  sentAt: Date | null = null;

  /**
   * A queued message is free to send when this is null or past. A server sending it first sets
   * it a while ahead (a claim only one server can win), and after a failed attempt sets it to
   * the time of the next one.
   */
  @Property({ type: DateTimeType, nullable: true })
  claimedUntil: Date | null = null;
}
