import { createHash } from 'node:crypto';
import type { AuditEventDto } from '@tiermode/shared-types';
import canonicalize from 'canonicalize';

export const GENESIS_HASH = '0'.repeat(64);

/** What an event's hash covers: everything in it but the hash and the signature of the hash. */
export type AuditContent = Omit<AuditEventDto, 'hash' | 'signature'>;

/** SHA-256 (hex) of the RFC 8785 canonical JSON of the event, its link included. */
export function auditHash(content: AuditContent): string {
  const canonical = canonicalize(content);
  if (canonical === undefined) throw new Error('The audit event cannot be written as JSON');
  return createHash('sha256').update(canonical, 'utf8').digest('hex');
}

/** Walks the chain in order: the first event whose hash or link fails, or null if all hold. */
export function firstBrokenEvent(
  events: readonly (AuditContent & { hash: string })[],
): number | null {
  let previous = GENESIS_HASH;
  for (const event of events) {
    const {
      hash,
      signature: _signature,
      ...content
    } = event as AuditContent & {
      hash: string;
      signature?: unknown;
    };
    void _signature;
    if (content.previousHash !== previous || auditHash(content) !== hash) return event.seq;
    previous = hash;
  }
  return null;
}
