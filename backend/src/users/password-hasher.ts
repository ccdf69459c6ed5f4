import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';

/** bcrypt cost factor: 2^12 rounds, a few hundred milliseconds per hash on this machine. */
export const BCRYPT_COST = 12;

/**
 * bcryptjs is plain JavaScript: on the main thread every sign-in would spend a few hundred
 * milliseconds of the one thread that answers every request. The hashing runs on worker
 * threads instead, so the server keeps answering while people sign in. The pool is our own
 * (about forty lines) because the maintained one, piscina, needs the worker as a separate file,
 * and this module runs both as TypeScript under Jest and as the built JavaScript.
 */
const WORKER_SOURCE = `
const { parentPort, workerData } = require('node:worker_threads');
const bcrypt = require(workerData.bcryptPath);
parentPort.on('message', ({ id, op, password, passwordHash, cost }) => {
  try {
    const result = op === 'hash' ? bcrypt.hashSync(password, cost) : bcrypt.compareSync(password, passwordHash);
    parentPort.postMessage({ id, result });
  } catch (error) {
    parentPort.postMessage({ id, error: error instanceof Error ? error.message : String(error) });
  }
});
`;

type Job = { resolve: (value: unknown) => void; reject: (error: Error) => void };

class HashingPool {
  private readonly workers: { worker: Worker; jobs: Map<number, Job> }[] = [];
  private nextId = 1;

  constructor(private readonly size: number) {}

  run(message: { op: 'hash' | 'compare'; password: string; passwordHash?: string; cost?: number }) {
    const slot = this.leastBusy();
    const id = this.nextId++;
    return new Promise<unknown>((resolve, reject) => {
      slot.jobs.set(id, { resolve, reject });
      // Keep the process alive while a hash is pending (a seed script awaits one), not after.
      if (slot.jobs.size === 1) slot.worker.ref();
      slot.worker.postMessage({ id, ...message });
    });
  }

  private leastBusy() {
    if (this.workers.length < this.size) this.workers.push(this.start());
    return this.workers.reduce((a, b) => (b.jobs.size < a.jobs.size ? b : a));
  }

  private start() {
    const worker = new Worker(WORKER_SOURCE, {
      eval: true,
      workerData: { bcryptPath: require.resolve('bcryptjs') },
    });
    const slot = { worker, jobs: new Map<number, Job>() };
    worker.unref();
    worker.on(
      'message',
      ({ id, result, error }: { id: number; result?: unknown; error?: string }) => {
        const job = slot.jobs.get(id);
        slot.jobs.delete(id);
        if (slot.jobs.size === 0) worker.unref();
        if (error === undefined) job?.resolve(result);
        else job?.reject(new Error(error));
      },
    );
    worker.on('error', (error) => this.fail(slot, error));
    worker.on('exit', (code) => this.fail(slot, new Error(`password worker exited (${code})`)));
    return slot;
  }

  /** A worker that dies takes its pending jobs with it (they fail) and is replaced on next use. */
  private fail(slot: { worker: Worker; jobs: Map<number, Job> }, error: Error) {
    const index = this.workers.indexOf(slot);
    if (index >= 0) this.workers.splice(index, 1);
    for (const job of slot.jobs.values()) job.reject(error);
    slot.jobs.clear();
  }
}

// One thread for the API, the rest (at least one) for hashing.
const pool = new HashingPool(Math.max(1, Math.min(4, availableParallelism() - 1)));

export async function hashPassword(password: string): Promise<string> {
  return (await pool.run({ op: 'hash', password, cost: BCRYPT_COST })) as string;
}

export async function verifyPassword(password: string, passwordHash: string): Promise<boolean> {
  return (await pool.run({ op: 'compare', password, passwordHash })) as boolean;
}
