import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { createServer } from 'node:net';
import { dirname, join } from 'node:path';

/**
 * The built server (backend/dist/main.js) as a child process, as `npm run serve` runs it: for the
 * browser journeys, the load run and the process tests (crash and two-server tests).
 */
export const REPO = findRepo(process.cwd());
const MAIN = join(REPO, 'backend', 'dist', 'main.js');

export interface ServerProcess {
  url: string;
  port: number;
  databasePath: string;
  child: ChildProcess;
  /** Everything the server printed so far. */
  output: () => string;
  /** Ends it with SIGTERM (a clean shutdown) and waits for the exit. */
  stop: () => Promise<void>;
  /** Ends it with SIGKILL: no shutdown hook runs, as in a crash or a power cut. */
  kill: () => Promise<void>;
}

/** A TCP port nothing listens on now. */
export function freePort(): Promise<number> {
  return new Promise((done, fail) => {
    const probe = createServer();
    probe.once('error', fail);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      probe.close(() => done(typeof address === 'object' && address ? address.port : 0));
    });
  });
}

/** Starts the server on `databasePath` and resolves once /api/health answers 200. */
export async function startServer(options: {
  databasePath: string;
  port?: number;
  env?: Record<string, string>;
  timeoutMs?: number;
}): Promise<ServerProcess> {
  if (!existsSync(MAIN)) {
    throw new Error(`Build first: ${MAIN} is missing (npm run build; npm test builds it).`);
  }
  const port = options.port ?? (await freePort());
  let log = '';
  const child = spawn(process.execPath, [MAIN], {
    cwd: REPO,
    env: {
      ...process.env,
      PORT: String(port),
      DATABASE_PATH: options.databasePath,
      DEMO: 'on',
      JWT_SECRET: '',
      // One demo account stands for a whole office in the load run and the journeys; the
      // per-person limit itself is tested in rate-limit.e2e-spec.ts.
      RATE_LIMIT_PER_MINUTE: '1000000',
      ...options.env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout?.on('data', (chunk: Buffer) => (log += chunk.toString()));
  child.stderr?.on('data', (chunk: Buffer) => (log += chunk.toString()));
  const exited = new Promise<void>((done) => child.once('exit', () => done()));
  const url = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + (options.timeoutMs ?? 30_000);
  for (;;) {
    if (child.exitCode !== null || child.signalCode !== null) {
      throw new Error(`The server exited early:\n${log}`);
    }
    try {
      if ((await fetch(`${url}/api/health`)).ok) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) {
      child.kill('SIGKILL');
      throw new Error(`The server did not answer /api/health in time:\n${log}`);
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  const end = async (signal: NodeJS.Signals) => {
    if (child.exitCode === null && child.signalCode === null) child.kill(signal);
    await exited;
  };
  return {
    url,
    port,
    databasePath: options.databasePath,
    child,
    output: () => log,
    stop: () => end('SIGTERM'),
    kill: () => end('SIGKILL'),
  };
}

/**
 * The newest mail the server's local catcher received for `to`, as its recipient got it (the
 * outbox page masks set-password links), read from the database file; waits up to 5 s.
 */
export async function receivedMail(
  databasePath: string,
  to: string,
): Promise<{ subject: string; text: string }> {
  // Loaded through require: this file runs as CommonJS under Jest and as ESM under Vitest.
  const { Database } = createRequire(join(REPO, 'backend', 'package.json'))(
    'sqlite3',
  ) as typeof import('sqlite3');
  for (let attempt = 0; attempt < 50; attempt += 1) {
    const row = await new Promise<{ subject: string; text: string } | undefined>(
      (resolve, reject) => {
        const db = new Database(databasePath, 1 /* OPEN_READONLY */, (openError) => {
          if (openError) return reject(openError);
          db.get(
            `select subject, text from mail_messages where "to" = ? and status = 'received' order by created_at desc limit 1`,
            [to],
            (error, found: { subject: string; text: string } | undefined) => {
              db.close();
              if (error) reject(error);
              else resolve(found);
            },
          );
        });
      },
    );
    if (row) return row;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`No mail to ${to} reached the catcher`);
}

/**
 * The repository root, found upwards from the working directory (this file is loaded both as
 * CommonJS by Jest and as an ES module by Vitest, so neither __dirname nor import.meta serves).
 */
function findRepo(from: string): string {
  for (let dir = from; ; dir = dirname(dir)) {
    const manifest = join(dir, 'package.json');
    if (
      existsSync(manifest) &&
      (JSON.parse(readFileSync(manifest, 'utf8')) as { name?: string }).name === 'tiermode'
    ) {
      return dir;
    }
    if (dirname(dir) === dir) throw new Error(`Not inside the Tiermode repository: ${from}`);
  }
}
