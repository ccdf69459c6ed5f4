import { EntityManager, UniqueConstraintViolationException } from '@mikro-orm/knex';
import { ConflictException, Injectable } from '@nestjs/common';
import type { AuditEventDto, AuditVerifyResponse } from '@tiermode/shared-types';
import { appendAuditEvent, type AuditEntry } from './append-audit-event';
import { AuditEvent } from './audit-event.entity';
import { SigningKey } from '../signing/signing-key';
import { AuditHead } from './audit-head';
import { auditHash, firstBrokenEvent } from './audit-hash';

@Injectable()
export class AuditService {
  // One link at a time: the next event needs the hash of the last one committed. Within one
  // process a promise chain is the lock. Across processes on one database file (two servers),
  // the event's sequence number is the primary key: of two changes that read the same last
  // link, the second one's insert fails, its whole transaction (the change too) rolls back, and
  // the caller gets a 409 to reload and try again. Nothing is lost silently.
  private tail: Promise<unknown> = Promise.resolve();

  constructor(
    private readonly em: EntityManager,
    private readonly key: SigningKey,
    private readonly head: AuditHead,
  ) {}

  /**
   * Appends the event to the chain and flushes `em` with it, so the change and its record are
   * written together or not at all. `guard` runs first inside the same transaction (a
   * conditional write that throws when the change is no longer allowed, say), so what it checked
   * still holds when the change is written, in this process or another on the same database.
   */
  commit(
    em: EntityManager,
    entry: AuditEntry,
    guard?: (em: EntityManager) => Promise<void>,
  ): Promise<void> {
    const run = this.tail.then(async () => {
      let event: AuditEvent;
      try {
        if (guard) {
          // The guard writes first, so the transaction holds SQLite's write lock before it
          // reads the last link: no other process can append in between.
          await em.begin();
          await guard(em);
          event = await appendAuditEvent(em, this.key, entry);
          await em.commit();
        } else {
          event = await appendAuditEvent(em, this.key, entry);
          await em.flush();
        }
      } catch (error) {
        if (guard) await em.rollback().catch(() => undefined);
        if (
          error instanceof UniqueConstraintViolationException &&
          /audit_events/.test(error.message)
        ) {
          throw new ConflictException(
            'Another change was saved at the same moment; nothing of yours was saved: reload and try again',
          );
        }
        throw error;
      }
      this.head.advance(event.seq, event.hash);
    });
    this.tail = run.catch(() => undefined);
    return run;
  }

  /** Whether `actorId` did any of `actions` to any of the calculations. */
  async hasActed(
    actorId: string,
    calculationIds: string[],
    actions: readonly string[],
  ): Promise<boolean> {
    const count = await this.em.count(AuditEvent, {
      actorId,
      calculationId: { $in: calculationIds },
      action: { $in: [...actions] },
    });
    return count > 0;
  }

  async historyOf(calculationId: string): Promise<AuditEventDto[]> {
    const events = await this.em.find(AuditEvent, { calculationId }, { orderBy: { seq: 'asc' } });
    return events.map(toDto);
  }

  /** The whole trail: hashes and links, signatures, and the signed head, each on its own. */
  async verify(): Promise<AuditVerifyResponse> {
    const events = (await this.em.find(AuditEvent, {}, { orderBy: { seq: 'asc' } })).map(toDto);
    const brokenAt = firstBrokenEvent(events);
    const unsigned = events.filter((e) => !e.signature).length;
    const firstInvalid =
      events.find((e) => e.signature && !this.key.verify('audit-event', e.hash, e.signature))
        ?.seq ?? null;
    const headStatus = this.head.check(events);
    const problems = [
      ...(brokenAt === null
        ? []
        : [`Event ${brokenAt} was changed or removed: its hash or link does not hold`]),
      ...(unsigned === 0 ? [] : [`${unsigned} event(s) carry no signature`]),
      ...(firstInvalid === null ? [] : [`Event ${firstInvalid}'s signature does not verify`]),
      ...(headStatus === 'valid' ? [] : [HEAD_PROBLEMS[headStatus]]),
    ];
    return {
      valid: problems.length === 0,
      events: events.length,
      brokenAt,
      signatures: { valid: unsigned === 0 && firstInvalid === null, unsigned, firstInvalid },
      head: { status: headStatus, seq: this.head.read()?.seq ?? null },
      problems,
    };
  }

  /** A calc's lock event: present, naming this seal's hash, signed, and whole. */
  async lockEventStatus(
    calculationId: string,
    sealHash: string,
  ): Promise<'valid' | 'missing' | 'invalid'> {
    const found = await this.em.findOne(AuditEvent, { calculationId, action: 'locked' });
    if (!found) return 'missing';
    const event = toDto(found);
    const { hash, signature, ...content } = event;
    const whole = auditHash(content) === hash && this.key.verify('audit-event', hash, signature);
    return whole && event.detail?.sealHash === sealHash ? 'valid' : 'invalid';
  }
}

const HEAD_PROBLEMS = {
  missing: 'The signed head of the chain is missing, so deleted events at its end would not show',
  invalid: 'The signed head of the chain does not match the events stored',
  ahead: 'Events at the end of the chain were deleted: it ends before its signed head',
} as const;

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
    signature: event.signature,
  };
}
