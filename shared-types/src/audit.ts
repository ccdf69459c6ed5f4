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
}

/** `GET /api/audit/verify`: whether every event's hash and link still hold. */
export interface AuditVerifyResponse {
  valid: boolean;
  events: number;
  /** The first event whose hash or link does not hold, or null. */
  brokenAt: number | null;
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
