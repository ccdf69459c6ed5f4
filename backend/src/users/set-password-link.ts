import { createHash, randomBytes } from 'node:crypto';

/** How long a set-password link works. */
export const SET_PASSWORD_LIFETIME_MS = 48 * 3600 * 1000;

/** Only the SHA-256 of a token is stored, so a leaked database holds no usable link. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

/** A fresh one-time token (256 bits, URL-safe) and what to store of it. */
export function newSetPasswordToken(now: Date = new Date()): {
  token: string;
  tokenHash: string;
  expiresAt: Date;
} {
  const token = randomBytes(32).toString('base64url');
  return {
    token,
    tokenHash: hashToken(token),
    expiresAt: new Date(now.getTime() + SET_PASSWORD_LIFETIME_MS),
  };
}
