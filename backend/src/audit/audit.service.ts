import { EntityManager } from '@mikro-orm/sqlite';
import { Injectable } from '@nestjs/common';
import type { AuditEventDto, AuditVerifyResponse } from '@tiermode/shared-types';
import type { User } from '../users/user.entity';
import { AuditEvent } from './audit-event.entity';
import { auditHash, firstBrokenEvent, GENESIS_HASH } from './audit-hash';

export interface AuditEntry {
  calculationId: string | null;
  actor: User;
  action: string;
  detail?: Record<string, unknown>;
}

@Injectable()
export class AuditService {
  // One link at a time: the next event needs the hash of the last one committed. Tiermode runs
  // as one process on one SQLite connection, so a promise chain is the whole lock.
  private tail: Promise<unknown> = Promise.resolve();

  constructor(private readonly em: EntityManager) {}

  /**
   * Appends the event to the chain and flushes `em` with it, so the change and its record are
   * written together or not at all.
   */
  commit(em: EntityManager, entry: AuditEntry): Promise<void> {
    const run = this.tail.then(async () => {
      const [last] = await em.find(AuditEvent, {}, { orderBy: { seq: 'desc' }, limit: 1 });
      const content = {
        seq: (last?.seq ?? 0) + 1,
        calculationId: entry.calculationId,
        actorId: entry.actor.id,
        actorName: entry.actor.name,
        action: entry.action,
        detail: entry.detail ?? null,
        at: new Date().toISOString(),
        previousHash: last?.hash ?? GENESIS_HASH,
      };
      em.create(AuditEvent, { ...content, hash: auditHash(content) });
      await em.flush();
    });
    this.tail = run.catch(() => undefined);
    return run;
  }

  async historyOf(calculationId: string): Promise<AuditEventDto[]> {
    const events = await this.em.find(AuditEvent, { calculationId }, { orderBy: { seq: 'asc' } });
    return events.map(toDto);
  }

  async verify(): Promise<AuditVerifyResponse> {
    const events = await this.em.find(AuditEvent, {}, { orderBy: { seq: 'asc' } });
    const brokenAt = firstBrokenEvent(events.map(toDto));
    return { valid: brokenAt === null, events: events.length, brokenAt };
  }
}

function toDto(event: AuditEvent): AuditEventDto {
  return {
    seq: event.seq,
    calculationId: event.calculationId,
    actorId: event.actorId,
    actorName: event.actorName,
    action: event.action,
    detail: event.detail,
    at: event.at,
    previousHash: event.previousHash,
    hash: event.hash,
  };
}
