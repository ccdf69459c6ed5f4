import { availableParallelism } from 'node:os';
import { WorkerPool } from '../common/worker-pool';

/** bcrypt cost factor: 2^12 rounds, a few hundred milliseconds per hash on this machine. */
export const BCRYPT_COST = 12;

type PasswordJob =
  | { op: 'hash'; password: string; cost: number }
  | { op: 'compare'; password: string; passwordHash: string };

/**
 * bcryptjs is plain JavaScript: on the main thread every sign-in would spend a few hundred
 * milliseconds of the one thread that answers every request. The hashing runs on worker
 * threads instead, so the server keeps answering while people sign in.
 */
const pool = new WorkerPool<PasswordJob, string | boolean>({
  // One thread for the API, the rest (at least one) for hashing.
  size: Math.max(1, Math.min(4, availableParallelism() - 1)),
  name: 'password',
  workerData: { bcryptPath: require.resolve('bcryptjs') },
  handler: `
const bcrypt = require(require('node:worker_threads').workerData.bcryptPath);
function handle(job) {
  return job.op === 'hash'
    ? bcrypt.hashSync(job.password, job.cost)
    : bcrypt.compareSync(job.password, job.passwordHash);
}`,
});

export async function hashPassword(password: string): Promise<string> {
  return (await pool.run({ op: 'hash', password, cost: BCRYPT_COST })) as string;
}

export async function verifyPassword(password: string, passwordHash: string): Promise<boolean> {
  return (await pool.run({ op: 'compare', password, passwordHash })) as boolean;
}
