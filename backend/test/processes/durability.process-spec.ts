import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { CalculationDto, CalculationInputs } from '@tiermode/shared-types';
import { Database } from 'sqlite3';
import { sampleInputs } from '../support/fixtures';
import { startServer, type ServerProcess } from '../support/server-process';

/**
 * Crash and concurrency: the built server as a child process on a SQLite file, killed with
 * SIGKILL while clients save edits, then started again on the same file.
 */
const DEMO_PASSWORD = 'tiermode-demo';

async function api<T = unknown>(
  server: ServerProcess,
  method: string,
  path: string,
  token?: string,
  body?: unknown,
): Promise<{ status: number; body: T }> {
  const res = await fetch(`${server.url}${path}`, {
    method,
    headers: {
      'Content-Type': 'application/json',
      ...(token ? { Authorization: `Bearer ${token}` } : {}),
    },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const text = await res.text();
  return { status: res.status, body: (text ? JSON.parse(text) : null) as T };
}

async function signIn(server: ServerProcess, role: string): Promise<string> {
  const res = await api<{ accessToken: string }>(server, 'POST', '/api/auth/login', undefined, {
    email: `${role}@tiermode.test`,
    password: DEMO_PASSWORD,
  });
  expect(res.status).toBe(200);
  return res.body.accessToken;
}

/** Edit number n: the title and the inputs both carry n, so a half-written calc would show. */
function edit(n: number, version: number) {
  const inputs: CalculationInputs = sampleInputs();
  inputs.storeys[0].mass = 300000 + n;
  inputs.storeys[2].label = `edit ${n}`;
  return { version, title: `Edit ${n}`, inputs };
}

function editNumberOf(calc: CalculationDto): number {
  const fromTitle = Number(/^Edit (\d+)$/.exec(calc.title)?.[1] ?? -1);
  const fromInputs = calc.inputs.storeys[0].mass - 300000;
  const fromLabel = Number(/^edit (\d+)$/.exec(calc.inputs.storeys[2].label ?? '')?.[1] ?? -2);
  // One edit, whole: the title, the mass and the label were all written by the same PATCH.
  expect({ fromTitle, fromInputs, fromLabel }).toEqual({
    fromTitle,
    fromInputs: fromTitle,
    fromLabel: fromTitle,
  });
  return fromTitle;
}

function integrityCheck(databasePath: string): Promise<string[]> {
  return new Promise((done, fail) => {
    const db = new Database(databasePath, (error) => {
      if (error) return fail(error);
      db.all('PRAGMA integrity_check', (err, rows: { integrity_check: string }[]) => {
        db.close();
        if (err) fail(err);
        else done(rows.map((r) => r.integrity_check));
      });
    });
  });
}

async function newDraft(server: ServerProcess, token: string, title: string) {
  const project = await api<{ id: string }>(server, 'POST', '/api/projects', token, {
    name: `${title} project`,
  });
  expect(project.status).toBe(201);
  const calc = await api<CalculationDto>(
    server,
    'POST',
    `/api/projects/${project.body.id}/calculations`,
    token,
    { title, inputs: sampleInputs() },
  );
  expect(calc.status).toBe(201);
  return calc.body;
}

describe('A server killed with SIGKILL while edits are being saved', () => {
  const databasePath = join(mkdtempSync(join(tmpdir(), 'tiermode-crash-')), 'crash.sqlite');
  let server: ServerProcess;

  afterAll(() => server?.stop());

  it('keeps every acknowledged edit, whole, and an intact database, over three crashes', async () => {
    server = await startServer({ databasePath });
    let token = await signIn(server, 'designer');
    // Four calcs, each with its own client saving edit after edit.
    const calcs = await Promise.all(
      [0, 1, 2, 3].map((i) => newDraft(server, token, `Crash test ${i}`)),
    );
    const acknowledged = new Map<string, { n: number; version: number }>();
    let next = 1;
    for (let crash = 1; crash <= 3; crash += 1) {
      let running = true;
      const clients = calcs.map(async (calc) => {
        let version =
          acknowledged.get(calc.id)?.version ??
          (await api<CalculationDto>(server, 'GET', `/api/calculations/${calc.id}`, token)).body
            .version;
        while (running) {
          const n = next++;
          try {
            const res = await api<CalculationDto>(
              server,
              'PATCH',
              `/api/calculations/${calc.id}`,
              token,
              edit(n, version),
            );
            if (res.status !== 200) throw new Error(`PATCH answered ${res.status}`);
            version = res.body.version;
            acknowledged.set(calc.id, { n, version });
          } catch (error) {
            if (running) throw error;
            return; // the server died under this request: it was never acknowledged
          }
        }
      });
      // Let the clients save for a while, then pull the plug mid-stream.
      await new Promise((r) => setTimeout(r, 600 + crash * 300));
      running = false;
      await server.kill();
      await Promise.all(clients);

      expect(await integrityCheck(databasePath)).toEqual(['ok']);
      server = await startServer({ databasePath });
      token = await signIn(server, 'designer');
      for (const calc of calcs) {
        const stored = await api<CalculationDto>(
          server,
          'GET',
          `/api/calculations/${calc.id}`,
          token,
        );
        expect(stored.status).toBe(200);
        const ack = acknowledged.get(calc.id)!;
        expect(ack).toBeDefined();
        // The last acknowledged edit is there, or one later edit whose answer the crash ate.
        expect(stored.body.version).toBeGreaterThanOrEqual(ack.version);
        expect(stored.body.version).toBeLessThanOrEqual(ack.version + 1);
        const n = editNumberOf(stored.body);
        if (stored.body.version === ack.version) expect(n).toBe(ack.n);
        else expect(n).toBeGreaterThan(ack.n);
        acknowledged.set(calc.id, { n, version: stored.body.version });
        // Each stored edit came with its audit event, in the same transaction: version 1 was the
        // creation, and every later version one edit.
        const history = await api<{ action: string }[]>(
          server,
          'GET',
          `/api/calculations/${calc.id}/history`,
          token,
        );
        expect(history.body.filter((e) => e.action === 'edited')).toHaveLength(
          stored.body.version - 1,
        );
      }
      const audit = await api<{ valid: boolean }>(
        server,
        'GET',
        '/api/audit/verify',
        await signIn(server, 'admin'),
      );
      expect(audit.body.valid).toBe(true);
    }
    expect(next).toBeGreaterThan(40);
  });
});

describe('Two servers on one database file editing the same calc', () => {
  const databasePath = join(mkdtempSync(join(tmpdir(), 'tiermode-two-')), 'two.sqlite');
  let first: ServerProcess;
  let second: ServerProcess;

  afterAll(async () => {
    await first?.stop();
    await second?.stop();
  });

  it('never lose an update silently: of two edits from one version, one wins and one gets 409', async () => {
    first = await startServer({ databasePath });
    second = await startServer({ databasePath });
    const tokens = [await signIn(first, 'designer'), await signIn(second, 'designer')];
    const calc = await newDraft(first, tokens[0], 'Two servers');
    let version = calc.version;
    let n = 0;
    for (let round = 0; round < 25; round += 1) {
      const [a, b] = [(n += 1), (n += 1)];
      const results = await Promise.all([
        api<CalculationDto>(
          first,
          'PATCH',
          `/api/calculations/${calc.id}`,
          tokens[0],
          edit(a, version),
        ),
        api<CalculationDto>(
          second,
          'PATCH',
          `/api/calculations/${calc.id}`,
          tokens[1],
          edit(b, version),
        ),
      ]);
      const statuses = results.map((r) => r.status).sort();
      expect(statuses).toEqual([200, 409]);
      const winner = results.find((r) => r.status === 200)!.body;
      const stored = await api<CalculationDto>(
        second,
        'GET',
        `/api/calculations/${calc.id}`,
        tokens[1],
      );
      // What is stored is the winner's edit, whole; the loser was told.
      expect(stored.body.version).toBe(winner.version);
      expect(editNumberOf(stored.body)).toBe(editNumberOf(winner));
      version = winner.version;
    }
    const audit = await api<{ valid: boolean }>(
      first,
      'GET',
      '/api/audit/verify',
      await signIn(first, 'admin'),
    );
    expect(audit.body.valid).toBe(true);
  });

  it('keep both of two edits of different calcs, or refuse one with 409; none is lost', async () => {
    const tokens = [await signIn(first, 'designer'), await signIn(second, 'designer')];
    const calcs = [
      await newDraft(first, tokens[0], 'Left calc'),
      await newDraft(second, tokens[1], 'Right calc'),
    ];
    const versions = calcs.map((c) => c.version);
    let conflicts = 0;
    for (let round = 1; round <= 25; round += 1) {
      const results = await Promise.all(
        [first, second].map((server, i) =>
          api<CalculationDto>(
            server,
            'PATCH',
            `/api/calculations/${calcs[i].id}`,
            tokens[i],
            edit(round, versions[i]),
          ),
        ),
      );
      for (const [i, res] of results.entries()) {
        expect([200, 409]).toContain(res.status);
        if (res.status === 409) conflicts += 1;
        const stored = (
          await api<CalculationDto>(first, 'GET', `/api/calculations/${calcs[i].id}`, tokens[0])
        ).body;
        if (res.status === 200) {
          expect(editNumberOf(stored)).toBe(round);
          versions[i] = res.body.version;
        } else {
          expect(stored.version).toBe(versions[i]);
          expect(res.body).toMatchObject({
            message: [expect.stringMatching(/at the same moment/)],
          });
        }
      }
    }
    // Most rounds keep both; a refused one was told, and nothing of it was written.
    expect(conflicts).toBeLessThan(25);
  });
});
