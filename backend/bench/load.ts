/**
 * `npm run load`: starts the built server on a fresh demo database (loopback, a free port), runs
 * the office workload of bench/load-run.ts, prints the table and a JSON line, and stops the
 * server. Options: --duration S (default 30), --connections N (default 50).
 */
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parseArgs } from 'node:util';
import { startServer } from '../test/support/server-process';
import { formatReport, runLoad } from './load-run';

async function main(): Promise<void> {
  const { values } = parseArgs({
    options: {
      duration: { type: 'string', default: '30' },
      connections: { type: 'string', default: '50' },
    },
  });
  const duration = Number(values.duration);
  const connections = Number(values.connections);
  if (!(duration > 0 && duration <= 600) || !(Number.isInteger(connections) && connections >= 2)) {
    throw new Error('--duration must be 1 to 600 seconds and --connections a whole number >= 2');
  }
  const databasePath = join(mkdtempSync(join(tmpdir(), 'tiermode-load-')), 'load.sqlite');
  const server = await startServer({ databasePath });
  try {
    const report = await runLoad(server.url, { duration, connections });
    console.log(formatReport(report));
    console.log(JSON.stringify(report));
  } finally {
    await server.stop();
  }
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : String(error));
  process.exit(1);
});
