import { compare, hash } from 'bcryptjs';

/** bcrypt cost factor: 2^12 rounds, a few hundred milliseconds per hash on this machine. */
export const BCRYPT_COST = 12;

export function hashPassword(password: string): Promise<string> {
  return hash(password, BCRYPT_COST);
}

export function verifyPassword(password: string, passwordHash: string): Promise<boolean> {
  return compare(password, passwordHash);
}
