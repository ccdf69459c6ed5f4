import { WorkerPool } from './worker-pool';

// Starting a worker thread takes a few tens of ms, more when every suite runs at once.
const TIMEOUT_MS = 30_000;

function pool(size = 2) {
  return new WorkerPool<{ op: string; value: number }, number>({
    size,
    name: 'test',
    workerData: { offset: 1000 },
    handler: `
const { workerData, threadId } = require('node:worker_threads');
function handle({ op, value }) {
  if (op === 'thread') return threadId;
  if (op === 'bytes') return new TextEncoder().encode('x'.repeat(value));
  if (op === 'pooled') return Buffer.from('y'.repeat(value));
  if (op === 'range') throw new RangeError('value must be at most 10 (row ' + value + ')');
  if (op === 'type') throw new TypeError('value must be a number');
  if (op === 'other') throw 'not an Error';
  if (op === 'exit') process.exit(3);
  return value + workerData.offset;
}`,
  });
}

type TestPool = ReturnType<typeof pool>;

/** A test with a pool of `size` threads, closed after it whatever happens. */
function withPool(name: string, size: number, body: (workers: TestPool) => Promise<void>) {
  it(
    name,
    async () => {
      const workers = pool(size);
      try {
        await body(workers);
      } finally {
        await workers.close();
      }
    },
    TIMEOUT_MS,
  );
}

describe('WorkerPool', () => {
  withPool(
    'runs each job on a worker with its workerData and answers each with its own result',
    2,
    async (workers) => {
      const results = await Promise.all(
        [1, 2, 3, 4].map((value) => workers.run({ op: 'add', value })),
      );
      expect(results).toEqual([1001, 1002, 1003, 1004]);
    },
  );

  withPool(
    'hands byte arrays over whole, moving an own buffer and copying a shared one',
    1,
    async (workers) => {
      const own = (await workers.run({ op: 'bytes', value: 100_000 })) as unknown as Uint8Array;
      expect(own.byteLength).toBe(100_000);
      expect(own.every((b) => b === 0x78)).toBe(true);
      // A small Buffer sits in a pool shared with the worker's others: moving it would empty
      // them, so it is copied, and the worker goes on working.
      for (let i = 0; i < 3; i += 1) {
        const pooled = (await workers.run({ op: 'pooled', value: 10 })) as unknown as Uint8Array;
        expect(new TextDecoder().decode(pooled)).toBe('yyyyyyyyyy');
      }
    },
  );

  withPool('refuses with the error the job threw, by name and message', 1, async (workers) => {
    const range = workers.run({ op: 'range', value: 7 });
    await expect(range).rejects.toBeInstanceOf(RangeError);
    await expect(range).rejects.toThrow('value must be at most 10 (row 7)');
    await expect(workers.run({ op: 'type', value: 0 })).rejects.toBeInstanceOf(TypeError);
    await expect(workers.run({ op: 'other', value: 0 })).rejects.toThrow('not an Error');
    // The worker is still there for the next job.
    await expect(workers.run({ op: 'add', value: 5 })).resolves.toBe(1005);
  });

  withPool(
    'fails the jobs of a worker that dies, and starts another for the next job',
    1,
    async (workers) => {
      const first = await workers.run({ op: 'thread', value: 0 });
      await expect(workers.run({ op: 'exit', value: 0 })).rejects.toThrow(
        'a test worker stopped (exit code 3)',
      );
      const next = await workers.run({ op: 'thread', value: 0 });
      expect(next).not.toBe(first);
    },
  );

  withPool(
    'starts a second thread only while the first is busy, and never more than its size',
    2,
    async (workers) => {
      await workers.run({ op: 'add', value: 0 });
      await workers.run({ op: 'add', value: 0 });
      expect(workers.threads).toBe(1);
      const threads = await Promise.all(
        [0, 1, 2, 3].map(() => workers.run({ op: 'thread', value: 0 })),
      );
      expect(new Set(threads).size).toBe(2);
      expect(workers.threads).toBe(2);
    },
  );

  it(
    'refuses jobs once closed',
    async () => {
      const workers = pool(1);
      await workers.run({ op: 'add', value: 1 });
      await workers.close();
      expect(workers.threads).toBe(0);
      await expect(workers.run({ op: 'add', value: 1 })).rejects.toThrow(
        'the test workers are closed',
      );
    },
    TIMEOUT_MS,
  );
});
