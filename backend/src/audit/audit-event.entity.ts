import { Entity, PrimaryKey, Property } from '@mikro-orm/core';

/**
 * An event of the audit trail. Ids are kept as plain values, not foreign keys, so the trail
 * outlives what it describes; `hash` covers the event and `previousHash`, so changing or
 * removing any event breaks every link after it.
 */
@Entity({ tableName: 'audit_events' })
export class AuditEvent {
  @PrimaryKey({ type: 'integer', autoincrement: false })
  seq!: number;

  @Property({ type: 'string', length: 36, nullable: true, index: true })
  calculationId: string | null = null;

  @Property({ type: 'string', length: 36 })
  actorId!: string;

  @Property({ type: 'string', length: 200 })
  actorName!: string;

  @Property({ type: 'string', length: 50 })
  action!: string;

  @Property({ type: 'json', nullable: true })
  detail: Record<string, unknown> | null = null;

  /** ISO time, kept as text so the hashed value is exactly what is stored. */
  @Property({ type: 'string', length: 30 })
  at!: string;

  @Property({ type: 'string', length: 64 })
  previousHash!: string;

  @Property({ type: 'string', length: 64 })
  hash!: string;

  /**
   * Ed25519 signature (base64) of the hash, by the server's seal key, which lives outside the
   * database: a rewritten event cannot be signed again. Null for events made before signing.
   */
  @Property({ type: 'string', length: 100, nullable: true })
  signature: string | null = null;
}
