/** One event of the audit trail; each carries the hash of the one before (a hash chain). */
export interface AuditEventDto {
  seq: number;
  calculationId: string | null;
  actorId: string;
  actorName: string;
  action: string;
  detail: Record<string, unknown> | null;
  /** ISO time */
  at: string;
  previousHash: string;
  hash: string;
  /**
   * Ed25519 signature (base64) of `tiermode-audit-event:<hash>` by the key published at
   * `GET /api/seal/public-key`; null for an event made before events were signed.
   */
  signature: string | null;
}

/**
 * `GET /api/audit/verify`: whether every event's hash and link still hold (`brokenAt`), whether
 * each event carries a valid signature (`signatures`), and whether the chain still reaches the
 * signed head kept outside the database (`head`: `ahead` means events at the end were deleted).
 * `valid` is all three.
 */
export interface AuditVerifyResponse {
  valid: boolean;
  events: number;
  /** The first event whose hash or link does not hold, or null. */
  brokenAt: number | null;
  signatures: {
    valid: boolean;
    /** Events without a signature (made before signing, or stripped). */
    unsigned: number;
    /** The first event whose signature does not verify, or null. */
    firstInvalid: number | null;
  };
  head: {
    status: 'valid' | 'missing' | 'invalid' | 'ahead';
    /** The sequence number the signed head records, or null when there is none. */
    seq: number | null;
  };
  /** What is wrong, in words; empty when valid. */
  problems: string[];
}

/** `GET /api/mail/outbox` (admin): what the mail catcher received, and mail not delivered. */
export interface MailMessageDto {
  id: string;
  /** received: taken in by the local catcher; queued: waiting to be (re)sent; failed: gave up. */
  status: 'received' | 'queued' | 'sent' | 'failed';
  from: string;
  to: string;
  subject: string;
  text: string;
  attempts: number;
  lastError: string | null;
  /** ISO time */
  createdAt: string;
}
