import { existsSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import type { SigningKey } from '../signing/signing-key';

/** The last link of the audit chain as last written, signed: kept beside the key. */
export interface AuditHeadRecord {
  seq: number;
  hash: string;
  signature: string;
}

export type AuditHeadStatus = 'valid' | 'missing' | 'invalid' | 'ahead';

/**
 * The signed head of the audit chain, in a file beside the seal key (outside the database). A
 * hash chain alone cannot show that its last events were deleted: the shorter chain is still
 * whole. The head records the last event written; a database whose chain ends before it lost
 * events. Written after each commit, only forward; a crash between the commit and this write
 * leaves the head one event behind, which verification accepts (events after the head are
 * still checked by their links and signatures).
 */
export class AuditHead {
  constructor(
    private readonly path: string,
    private readonly key: SigningKey,
  ) {}

  read(): AuditHeadRecord | null {
    if (!existsSync(this.path)) return null;
    try {
      const parsed = JSON.parse(readFileSync(this.path, 'utf8')) as Partial<AuditHeadRecord>;
      if (typeof parsed.seq !== 'number' || typeof parsed.hash !== 'string') return null;
      return { seq: parsed.seq, hash: parsed.hash, signature: String(parsed.signature ?? '') };
    } catch {
      return null;
    }
  }

  /** Moves the head to this event, unless it already stands at or past it. */
  advance(seq: number, hash: string): void {
    const current = this.read();
    if (current && current.seq >= seq) return;
    const record: AuditHeadRecord = {
      seq,
      hash,
      signature: this.key.sign('audit-head', `${seq}:${hash}`),
    };
    const temporary = `${this.path}.${process.pid}.tmp`;
    writeFileSync(temporary, `${JSON.stringify(record)}\n`, { mode: 0o600 });
    renameSync(temporary, this.path);
  }

  /** The head against the chain as stored (events in order of seq). */
  check(events: readonly { seq: number; hash: string }[]): AuditHeadStatus {
    const head = this.read();
    if (!head) return events.length === 0 ? 'valid' : 'missing';
    if (!this.key.verify('audit-head', `${head.seq}:${head.hash}`, head.signature))
      return 'invalid';
    const last = events.at(-1);
    if (!last || last.seq < head.seq) return 'ahead';
    const at = events.find((e) => e.seq === head.seq);
    return at && at.hash === head.hash ? 'valid' : 'invalid';
  }
}
