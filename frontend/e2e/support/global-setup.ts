import { existsSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { TestProject } from 'vitest/node';
import { REPO, startServer } from '../../../backend/test/support/server-process';

declare module 'vitest' {
  export interface ProvidedContext {
    baseURL: string;
    databasePath: string;
  }
}

/** Starts the built server on a free port with a fresh demo database, as `npm run serve` does. */
export default async function setup(project: TestProject) {
  if (!existsSync(join(REPO, 'frontend', 'dist', 'index.html'))) {
    throw new Error('Build first: the journeys drive the built app (npm test builds it).');
  }
  const dataDir = mkdtempSync(join(tmpdir(), 'tiermode-journeys-'));
  const server = await startServer({ databasePath: join(dataDir, 'journeys.sqlite') });
  project.provide('baseURL', server.url);
  project.provide('databasePath', server.databasePath);
  return () => server.stop();
}
