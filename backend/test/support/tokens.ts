import { sign, type Algorithm } from 'jsonwebtoken';
import { JWT_AUDIENCE, JWT_ISSUER } from '../../src/auth/jwt-claims';

const base64url = (value: object) => Buffer.from(JSON.stringify(value)).toString('base64url');

/** A token as the server would issue it, with every part overridable to forge a bad one. */
export function forgeToken(options: {
  secret?: string;
  algorithm?: Algorithm;
  claims: Record<string, unknown>;
  expiresIn?: number;
  issuer?: string;
  audience?: string;
}): string {
  return sign(options.claims, options.secret ?? (process.env.JWT_SECRET as string), {
    algorithm: options.algorithm ?? 'HS256',
    expiresIn: options.expiresIn ?? 3600,
    issuer: options.issuer ?? JWT_ISSUER,
    audience: options.audience ?? JWT_AUDIENCE,
  });
}

/** An unsigned token (`alg: none`) carrying otherwise valid claims. */
export function unsignedToken(claims: Record<string, unknown>): string {
  const now = Math.floor(Date.now() / 1000);
  const payload = { ...claims, iat: now, exp: now + 3600, iss: JWT_ISSUER, aud: JWT_AUDIENCE };
  return `${base64url({ alg: 'none', typ: 'JWT' })}.${base64url(payload)}.`;
}
