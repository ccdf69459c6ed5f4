import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { formatReport, runLoad } from '../../bench/load-run';
import { startServer, type ServerProcess } from '../support/server-process';

/**
 * The load run of `npm run load` (30 s x 50 connections there), short: 3 s per phase at 10
 * connections, against the built server on a fresh demo database. It checks that the mixed
 * workload runs without one error and that the report is whole; speed is for `npm run load`.
 */
describe('The load run, as a smoke test', () => {
  let server: ServerProcess;

  beforeAll(async () => {
    const databasePath = join(mkdtempSync(join(tmpdir(), 'tiermode-load-')), 'load.sqlite');
    server = await startServer({ databasePath });
  });
  afterAll(() => server?.stop());

  it('answers every request of the mixed workload (sign-in, lists, calcs, analyses) with a 2xx', async () => {
    const report = await runLoad(server.url, { duration: 3, connections: 10 });
    console.log(formatReport(report));
    // The analysis phases too: 20 storeys whole and lean, 200 storeys lean.
    expect(report.analysis.map((a) => `${a.storeys} ${a.detail}`)).toEqual([
      '20 full',
      '20 summary',
      '200 summary',
    ]);
    for (const phase of [report.health, ...report.analysis, report.workload, report.signIn]) {
      expect(phase.errors).toBe(0);
      expect(Object.keys(phase.statusCounts)).toEqual(['200']);
      expect(phase.p99Ms).toBeGreaterThanOrEqual(phase.p50Ms);
    }
    // Every one of the six workload requests ran at least a few times, and someone signed in.
    expect(report.workload.requests).toBeGreaterThanOrEqual(12);
    expect(report.signIn.requests).toBeGreaterThanOrEqual(1);
    expect(report.throughputRatio).toBeGreaterThan(0);
    for (const phase of report.analysis) expect(phase.ratio).toBeGreaterThan(0);
    expect(formatReport(report)).toMatch(
      /throughput ratio, workload \+ sign-in over \/api\/health/,
    );
    // The server is still well afterwards.
    expect((await fetch(`${server.url}/api/health`)).status).toBe(200);
  });

  it('refuses to aim at anything but this machine', async () => {
    await expect(runLoad('http://example.com', { duration: 1, connections: 2 })).rejects.toThrow(
      /only targets this machine/,
    );
  });
});
