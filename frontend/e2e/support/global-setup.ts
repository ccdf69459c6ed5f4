import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import type { TestProject } from 'vitest/node';

declare module 'vitest' {
  export interface ProvidedContext {
    baseURL: string;
  }
}

const repo = resolve(import.meta.dirname, '..', '..', '..');

function freePort(): Promise<number> {
  return new Promise((done, fail) => {
    const probe = createServer();
    probe.once('error', fail);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      probe.close(() => done(typeof address === 'object' && address ? address.port : 0));
    });
  });
}

async function waitForHealth(
  url: string,
  server: ChildProcess,
  output: () => string,
): Promise<void> {
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    if (server.exitCode !== null) throw new Error(`The server exited early:\n${output()}`);
    try {
      const res = await fetch(`${url}/api/health`);
      if (res.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`The server did not answer /api/health within 30 s:\n${output()}`);
}

/** Starts the built server on a free port with a fresh demo database, as `npm run serve` does. */
export default async function setup(project: TestProject) {
  const main = join(repo, 'backend', 'dist', 'main.js');
  if (!existsSync(main) || !existsSync(join(repo, 'frontend', 'dist', 'index.html'))) {
    throw new Error('Build first: the journeys drive the built app (npm test builds it).');
  }
  const port = await freePort();
  const dataDir = mkdtempSync(join(tmpdir(), 'tiermode-journeys-'));
  let log = '';
  const server = spawn(process.execPath, [main], {
    cwd: repo,
    env: {
      ...process.env,
      PORT: String(port),
      DATABASE_PATH: join(dataDir, 'journeys.sqlite'),
      DEMO: 'on',
      JWT_SECRET: '',
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  server.stdout?.on('data', (chunk: Buffer) => (log += chunk.toString()));
  server.stderr?.on('data', (chunk: Buffer) => (log += chunk.toString()));
  const baseURL = `http://127.0.0.1:${port}`;
  await waitForHealth(baseURL, server, () => log);
  project.provide('baseURL', baseURL);
  return async () => {
    server.kill('SIGTERM');
    await new Promise((r) => server.once('exit', r));
  };
}
