import type { EntityManager } from '@mikro-orm/knex';
import { AuditEvent } from './audit-event.entity';
import type { SigningKey } from '../signing/signing-key';
import { auditHash, GENESIS_HASH } from './audit-hash';

export interface AuditEntry {
  calculationId: string | null;
  actor: { id: string; name: string };
  action: string;
  detail?: Record<string, unknown>;
  at?: Date;
}

/**
 * Adds the next link of the chain to `em` (written by its next flush). The caller makes sure no
 * other event is appended between this read of the last link and that flush.
 */
export async function appendAuditEvent(
  em: EntityManager,
  key: SigningKey,
  entry: AuditEntry,
): Promise<AuditEvent> {
  const [last] = await em.find(AuditEvent, {}, { orderBy: { seq: 'desc' }, limit: 1 });
  const content = {
    seq: (last?.seq ?? 0) + 1,
    calculationId: entry.calculationId,
    actorId: entry.actor.id,
    actorName: entry.actor.name,
    action: entry.action,
    detail: entry.detail ?? null,
    at: (entry.at ?? new Date()).toISOString(),
    previousHash: last?.hash ?? GENESIS_HASH,
  };
  const hash = auditHash(content);
  return em.create(AuditEvent, { ...content, hash, signature: key.sign('audit-event', hash) });
}
