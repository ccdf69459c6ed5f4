import { performance } from 'node:perf_hooks';
import { compareSync, getRounds } from 'bcryptjs';
import { BCRYPT_COST, hashPassword, verifyPassword } from './password-hasher';

// A cost-12 bcrypt hash takes a few hundred ms on this machine, and several seconds when every
// suite of `npm test` runs at once on its two cores: these tests get an honest 30 s each.
const HASHING_TIMEOUT_MS = 30_000;

describe('password hashing on worker threads', () => {
  it(
    'makes standard bcrypt hashes at cost 12 that verify, and refuses a wrong password',
    async () => {
      const hash = await hashPassword('a long enough secret 2026');
      expect(hash).toMatch(/^\$2[aby]\$12\$/);
      expect(getRounds(hash)).toBe(BCRYPT_COST);
      // Checked on this thread by bcryptjs itself: the worker's hash is a real bcrypt hash.
      expect(compareSync('a long enough secret 2026', hash)).toBe(true);
      await expect(verifyPassword('a long enough secret 2026', hash)).resolves.toBe(true);
      await expect(verifyPassword('a long enough secret 2027', hash)).resolves.toBe(false);
    },
    HASHING_TIMEOUT_MS,
  );

  it(
    'answers several at once, each with its own result',
    async () => {
      const passwords = ['first secret 11', 'second secret 22', 'third secret 33'];
      const hashes = await Promise.all(passwords.map(hashPassword));
      const checks = await Promise.all(
        passwords.map((p, i) => verifyPassword(p, hashes[(i + 1) % passwords.length])),
      );
      expect(checks).toEqual([false, false, false]);
      expect(await Promise.all(passwords.map((p, i) => verifyPassword(p, hashes[i])))).toEqual([
        true,
        true,
        true,
      ]);
    },
    HASHING_TIMEOUT_MS,
  );

  it(
    'leaves this thread free while it hashes (the event loop is mostly idle meanwhile)',
    async () => {
      await hashPassword('warm up the worker 00');
      const before = performance.eventLoopUtilization();
      await hashPassword('measure me please 01');
      const used = performance.eventLoopUtilization(before);
      // On this thread a cost-12 hash keeps the loop busy nearly all the time (utilisation near 1).
      expect(used.utilization).toBeLessThan(0.3);
    },
    HASHING_TIMEOUT_MS,
  );

  it(
    'turns a malformed stored hash into a refusal, not a crash',
    async () => {
      await expect(verifyPassword('anything at all 99', 'not-a-bcrypt-hash')).resolves.toBe(false);
    },
    HASHING_TIMEOUT_MS,
  );
});
