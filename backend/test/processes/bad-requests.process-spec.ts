import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { HISTORY_LIMITS, ANALYSIS_LIMITS } from '@tiermode/shared-types';
import { JSON_BODY_LIMIT } from '../../src/app.setup';
import { DEMO_PASSWORD } from '../../src/database/demo-accounts';
import { ASCE_BASIS } from '../support/fixtures';
import { startServer, type ServerProcess } from '../support/server-process';

/**
 * Bodies that cannot be read, sent to the built server as a browser or a script would. Here the
 * web app is served beside the API, and its static-file handler once turned every body-parser
 * error into "404 Cannot POST"; the e2e app serves no web app, so this is checked here.
 */
describe('Requests that cannot be read', () => {
  let server: ServerProcess;
  let token: string;

  beforeAll(async () => {
    const databasePath = join(mkdtempSync(join(tmpdir(), 'tiermode-bad-')), 'bad.sqlite');
    server = await startServer({ databasePath });
    const login = await fetch(`${server.url}/api/auth/login`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: 'designer@tiermode.test', password: DEMO_PASSWORD }),
    });
    token = ((await login.json()) as { accessToken: string }).accessToken;
  });
  afterAll(() => server?.stop());

  const post = async (path: string, body: string, headers: Record<string, string> = {}) => {
    const res = await fetch(`${server.url}${path}`, {
      method: 'POST',
      headers: {
        Authorization: `Bearer ${token}`,
        'Content-Type': 'application/json',
        ...headers,
      },
      body,
    });
    return { status: res.status, body: (await res.json()) as { message: string[] } };
  };

  it('serves the web app beside the API, so these answers come from the real set-up', async () => {
    const page = await fetch(`${server.url}/projects`);
    expect(page.status).toBe(200);
    expect(page.headers.get('content-type')).toMatch(/^text\/html/);
  });

  it.each([
    ['malformed JSON', '{"storeys": [', {}, /^The request body is not valid JSON: /],
    [
      'a __proto__ key',
      '{"__proto__": {"x": 1}, "storeys": []}',
      {},
      /^The request has a field named "__proto__", which is not allowed$/,
    ],
    [
      'an unsupported charset',
      '{"storeys": []}',
      { 'Content-Type': 'application/json; charset=iso-8859-1' },
      /^The request body's charset "iso-8859-1" is not supported; send UTF-8$/,
    ],
    [
      'an unknown content encoding',
      '{"storeys": []}',
      { 'Content-Encoding': 'compress-magic' },
      /^The request body's content encoding is not supported/,
    ],
    [
      'gzip that is not gzip',
      'not gzip at all',
      { 'Content-Encoding': 'gzip' },
      /^The request body could not be read$/,
    ],
  ])('answers %s with 400 in the error shape', async (_, body, headers, message) => {
    for (const path of ['/api/analysis', '/api/projects', '/api/auth/login']) {
      const res = await post(path, body, headers);
      expect(res.status).toBe(400);
      expect(res.body).toEqual({
        statusCode: 400,
        message: [expect.stringMatching(message)],
        error: 'Bad Request',
      });
    }
  });

  it('answers a body over the limit with 413 naming the limit', async () => {
    const res = await post('/api/analysis', `{"pad": "${'x'.repeat(JSON_BODY_LIMIT)}"}`);
    expect(res.status).toBe(413);
    expect(res.body.message).toEqual(['The request body is too large (the limit is 4096 KB)']);
  });

  it('accepts the largest request the API allows, with room to spare', async () => {
    // 500 labelled storeys at full double precision, 1,000 spectrum points, a basis with a
    // weight per level, indented as a person might send it (today's default limit was 100 KB).
    const n = ANALYSIS_LIMITS.maxStoreys;
    const storeys = Array.from({ length: n }, (_, i) => ({
      label: `Level ${i + 1} ${'—'.repeat(40)}`.slice(0, 60),
      mass: 250000.12345678901 + i / 7,
      stiffness: 350000000.12345678 + i / 3,
      height: 3.5000000000000004,
    }));
    const points = Array.from({ length: ANALYSIS_LIMITS.maxSpectrumPoints }, (_, i) => ({
      period: i / 100 + 1e-13,
      sa: 0.40000000000000013 + 1 / (i + 3),
    }));
    const basis = {
      ...ASCE_BASIS,
      omega0: 3,
      hn: 1750,
      seismicWeights: storeys.map((s) => s.mass * 9.80665),
    };
    const body = JSON.stringify(
      {
        storeys,
        spectrum: { points, interpolation: 'linear' },
        dampingRatio: 0.05,
        targetMassRatio: 0.9,
        combination: 'cqc',
        basis,
      },
      null,
      2,
    );
    expect(body.length).toBeGreaterThan(150 * 1024);
    expect(body.length).toBeLessThan(JSON_BODY_LIMIT / 2);
    const res = await post('/api/checks', body);
    expect(res.status).toBe(200);
    expect((res.body as unknown as { storeys: unknown[] }).storeys).toHaveLength(n);
  });

  it('accepts the longest ground-motion record, written at full precision', async () => {
    // 60,000 samples, each with 17 significant digits, indented: the largest record allowed.
    const accelerations = Array.from(
      { length: HISTORY_LIMITS.maxRecordSteps },
      (_, k) => -0.123456789012345 * Math.sin(k / 9.1) - 1e-17,
    );
    const body = JSON.stringify(
      { record: { timeStep: 0.0005, units: 'g', accelerations }, dampingRatio: 0.05, periods: [1] },
      null,
      2,
    );
    expect(body.length).toBeGreaterThan(1024 * 1024);
    expect(body.length).toBeLessThan(JSON_BODY_LIMIT);
    const res = await post('/api/record-spectrum', body);
    expect(res.status).toBe(200);
    expect((res.body as unknown as { sa: number[] }).sa).toHaveLength(1);
  });
});
