import { Worker } from 'node:worker_threads';

/**
 * A few worker threads that run one kind of CPU-bound job off the thread that answers every
 * request: password hashing (bcryptjs is plain JavaScript), and the analysis of a tall building.
 * Our own, about a hundred lines, because the maintained pool (piscina) loads its worker from a
 * separate JavaScript file, and these jobs run both as TypeScript under Jest and as the built
 * JavaScript: here the worker is a short script given as text, which requires what it needs.
 *
 * `handler` is that script's body: CommonJS that may read `workerData` and must define
 * `function handle(task)`, returning the result (anything the structured clone can carry; a
 * byte array is moved to this thread, not copied).
 * A job whose handler throws is rejected with an error of the same name (RangeError, TypeError,
 * else Error) and message. A worker that dies fails its pending jobs and is replaced on next use.
 * Idle workers do not keep the process alive.
 */
export class WorkerPool<Task, Result> {
  private readonly workers: Slot[] = [];
  private nextId = 1;
  private closed = false;

  constructor(
    private readonly options: {
      /** Threads at most; each is started on first need. */
      size: number;
      handler: string;
      workerData?: unknown;
      /** For error messages: "password", "analysis". */
      name: string;
    },
  ) {}

  run(task: Task): Promise<Result> {
    if (this.closed)
      return Promise.reject(new Error(`the ${this.options.name} workers are closed`));
    const slot = this.leastBusy();
    const id = this.nextId++;
    return new Promise<Result>((resolve, reject) => {
      slot.jobs.set(id, { resolve: resolve as (value: unknown) => void, reject });
      // Keep the process alive while a job is pending (a seed script awaits one), not after.
      if (slot.jobs.size === 1) slot.worker.ref();
      slot.worker.postMessage({ id, task });
    });
  }

  /** Stops every worker; pending jobs fail. */
  async close(): Promise<void> {
    this.closed = true;
    const slots = this.workers.splice(0);
    await Promise.all(slots.map((slot) => slot.worker.terminate()));
  }

  /** For tests: the threads started and not yet gone. */
  get threads(): number {
    return this.workers.length;
  }

  private leastBusy(): Slot {
    if (this.workers.length < this.options.size && this.workers.every((s) => s.jobs.size > 0)) {
      this.workers.push(this.start());
    }
    return this.workers.reduce((a, b) => (b.jobs.size < a.jobs.size ? b : a));
  }

  private start(): Slot {
    const worker = new Worker(`${this.options.handler}\n${DISPATCH}`, {
      eval: true,
      workerData: this.options.workerData,
    });
    const slot: Slot = { worker, jobs: new Map() };
    worker.unref();
    worker.on('message', ({ id, result, error }: Reply) => {
      const job = slot.jobs.get(id);
      slot.jobs.delete(id);
      if (slot.jobs.size === 0) worker.unref();
      if (error === undefined) job?.resolve(result);
      else job?.reject(revived(error));
    });
    worker.on('error', (error) => this.fail(slot, error));
    worker.on('exit', (code) =>
      this.fail(slot, new Error(`a ${this.options.name} worker stopped (exit code ${code})`)),
    );
    return slot;
  }

  private fail(slot: Slot, error: Error): void {
    const index = this.workers.indexOf(slot);
    if (index >= 0) this.workers.splice(index, 1);
    for (const job of slot.jobs.values()) job.reject(error);
    slot.jobs.clear();
  }
}

/** Appended to every handler: one message in, one reply out, errors by name and message. */
const DISPATCH = `
require('node:worker_threads').parentPort.on('message', ({ id, task }) => {
  const { parentPort } = require('node:worker_threads');
  try {
    const result = handle(task);
    // Moved only when the bytes are their buffer's whole (a pooled Buffer shares one).
    const moved =
      ArrayBuffer.isView(result) &&
      result.buffer instanceof ArrayBuffer &&
      result.byteLength === result.buffer.byteLength
        ? [result.buffer]
        : [];
    parentPort.postMessage({ id, result }, moved);
  } catch (error) {
    const e = error instanceof Error ? error : new Error(String(error));
    parentPort.postMessage({ id, error: { name: e.name, message: e.message } });
  }
});
`;

interface Slot {
  worker: Worker;
  jobs: Map<number, { resolve: (value: unknown) => void; reject: (error: Error) => void }>;
}

interface Reply {
  id: number;
  result?: unknown;
  error?: { name: string; message: string };
}

function revived({ name, message }: { name: string; message: string }): Error {
  if (name === 'RangeError') return new RangeError(message);
  if (name === 'TypeError') return new TypeError(message);
  return new Error(message);
}
