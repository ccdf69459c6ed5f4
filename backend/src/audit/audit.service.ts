import { EntityManager } from '@mikro-orm/sqlite';
import { Injectable } from '@nestjs/common';
import type { AuditEventDto, AuditVerifyResponse } from '@tiermode/shared-types';
import { appendAuditEvent, type AuditEntry } from './append-audit-event';
import { AuditEvent } from './audit-event.entity';
import { firstBrokenEvent } from './audit-hash';

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
      await appendAuditEvent(em, entry);
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
