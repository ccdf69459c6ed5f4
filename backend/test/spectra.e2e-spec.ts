import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import type { App } from 'supertest/types';
import { ANALYSIS_LIMITS } from '@tiermode/shared-types';
import { createTestApp, tokenFor } from './support/test-app';

describe('POST /api/spectra/generate', () => {
  let app: INestApplication<App>;
  let token: string;
  const post = (body: object) =>
    request(app.getHttpServer())
      .post('/api/spectra/generate')
      .set('Authorization', `Bearer ${token}`)
      .send(body);

  beforeAll(async () => {
    app = await createTestApp();
    token = await tokenFor(app, 'designer');
  });
  afterAll(() => app.close());

  it('returns an ASCE 7 two-period table that the analysis accepts as it is', async () => {
    const res = await post({ kind: 'asce7-two-period', sds: 1, sd1: 0.6, tl: 8 }).expect(200);
    expect(res.body.points[0]).toEqual({ period: 0, sa: 0.4 });
    expect(res.body.points).toContainEqual({ period: 0.6, sa: 1 });
    expect(res.body.basis).toMatch(/ASCE 7-16 11\.4\.6/);
    const storeys = [{ mass: 2e5, stiffness: 3e8, height: 3.5 }];
    await request(app.getHttpServer())
      .post('/api/analysis')
      .set('Authorization', `Bearer ${token}`)
      .send({
        storeys,
        spectrum: { points: res.body.points, interpolation: res.body.interpolation },
        dampingRatio: 0.05,
      })
      .expect(200);
  });

  it('returns the source, which the analysis and a calc take with the table', async () => {
    const res = await post({ kind: 'asce7-two-period', sds: 1, sd1: 0.6, tl: 4, maxPeriod: 5 });
    expect(res.body.source).toEqual({
      kind: 'asce7-two-period',
      parameters: { sds: 1, sd1: 0.6, tl: 4, maxPeriod: 5 },
    });
    // One storey of T = 2 pi s, past the table's 5 s: the T > TL branch SD1 TL / T^2
    // (ASCE 7-16 11.4.6, clause from memory).
    const analysis = (spectrum: object) =>
      request(app.getHttpServer())
        .post('/api/analysis')
        .set('Authorization', `Bearer ${token}`)
        .send({
          storeys: [{ mass: 1e5, stiffness: 1e5, height: 4 }],
          spectrum,
          dampingRatio: 0.05,
        });
    const { points, interpolation, source } = res.body;
    const ok = await analysis({ points, interpolation, source }).expect(200);
    expect(ok.body.modes[0].sa).toBeCloseTo((0.6 * 4) / (2 * Math.PI) ** 2, 12);
    const bad = await analysis({
      points,
      source: { kind: 'asce7-two-period', parameters: { sds: 1, sd1: 0.6, tl: 400 } },
    }).expect(400);
    expect(bad.body.message).toContain('spectrum.source: parameters.tl must be at most 50 (s)');
    const unknown = await analysis({ points, source: { kind: 'mine' } }).expect(400);
    expect(unknown.body.message).toContain(
      'spectrum.source: kind must be one of: user, asce7-two-period, en1998-elastic, en1998-design',
    );
  });

  it('returns EN 1998-1 elastic and design tables', async () => {
    const elastic = await post({
      kind: 'en1998-elastic',
      agR: 0.25,
      groundType: 'C',
      spectrumType: 1,
    }).expect(200);
    expect(elastic.body.points).toContainEqual({ period: 0.6, sa: expect.closeTo(0.71875, 12) });
    const design = await post({
      kind: 'en1998-design',
      agR: 0.3,
      groundType: 'B',
      spectrumType: 1,
      q: 4,
    }).expect(200);
    expect(design.body.points[0].sa).toBeCloseTo(0.24, 12);
  });

  it.each([
    [{ kind: 'asce7-two-period', sds: -1, sd1: 0.6, tl: 8 }, 'sds must be a positive number (g)'],
    [{ kind: 'asce7-two-period', sds: 1, tl: 8 }, 'sd1 must be a number (g)'],
    [
      { kind: 'asce7-two-period', sds: 1, sd1: 0.6, tl: 0.3 },
      'tl must be longer than Ts = SD1/SDS',
    ],
    [
      { kind: 'en1998-elastic', agR: 0.2, groundType: 'F', spectrumType: 1 },
      'groundType must be one of A, B, C, D, E',
    ],
    [
      { kind: 'en1998-elastic', agR: 0.2, groundType: 'A', spectrumType: 3 },
      'spectrumType must be 1 or 2',
    ],
    [
      { kind: 'en1998-design', agR: 0.2, groundType: 'A', spectrumType: 1 },
      'q must be a number (behaviour factor)',
    ],
    [
      { kind: 'en1998-design', agR: 0.2, groundType: 'A', spectrumType: 1, q: 0 },
      'q must be a positive number (behaviour factor)',
    ],
    [{ kind: 'mystery' }, 'kind must be one of: asce7-two-period, en1998-elastic, en1998-design'],
    // Unbounded periods once held the server for seconds and, larger, ran it out of memory.
    [{ kind: 'asce7-two-period', sds: 1, sd1: 0.6, tl: 1e9 }, 'tl must be at most 50 (s)'],
    [
      { kind: 'asce7-two-period', sds: 1, sd1: 0.6, tl: 8, maxPeriod: 1e6 },
      'maxPeriod must be at most 100 (s)',
    ],
    [
      { kind: 'en1998-elastic', agR: 0.2, groundType: 'A', spectrumType: 1, maxPeriod: 1e300 },
      'maxPeriod must be at most 100 (s)',
    ],
    [
      { kind: 'en1998-design', agR: 1e9, groundType: 'A', spectrumType: 1, q: 4 },
      'agR must be at most 10 (g)',
    ],
    [
      { kind: 'en1998-elastic', agR: 0.2, groundType: 'A', spectrumType: 1, dampingPercent: 1e9 },
      'dampingPercent must be at most 100 (%)',
    ],
  ])('refuses %j with 400 naming the field', async (body, message) => {
    const res = await post(body).expect(400);
    expect(res.body.message).toContain(message);
  });

  it('answers the longest tables it allows at once, within the analysis point limit', async () => {
    const asce = await post({
      kind: 'asce7-two-period',
      sds: 1,
      sd1: 0.6,
      tl: 50,
      maxPeriod: 100,
    }).expect(200);
    const en = await post({
      kind: 'en1998-design',
      agR: 0.3,
      groundType: 'B',
      spectrumType: 1,
      q: 4,
      maxPeriod: 100,
    }).expect(200);
    for (const table of [asce.body.points, en.body.points] as { period: number }[][]) {
      expect(table.length).toBeLessThanOrEqual(ANALYSIS_LIMITS.maxSpectrumPoints);
      expect(table.at(-1)?.period).toBe(100);
    }
  });
});

describe('POST /api/analysis/column-stiffness', () => {
  let app: INestApplication<App>;
  let token: string;

  beforeAll(async () => {
    app = await createTestApp();
    token = await tokenFor(app, 'designer');
  });
  afterAll(() => app.close());

  const post = (body: object) =>
    request(app.getHttpServer())
      .post('/api/analysis/column-stiffness')
      .set('Authorization', `Bearer ${token}`)
      .send(body);

  it('sums c E I / h^3 over the column groups (c = 12 fixed-fixed, 3 fixed-pinned)', async () => {
    // Hand-worked: 12 x 30e9 x 2.13333e-3 / 3.5^3 = 17,912,536 N/m per fixed-fixed column.
    const i = 0.4 ** 4 / 12;
    const res = await post({
      height: 3.5,
      columns: [
        { elasticModulus: 30e9, secondMoment: i, count: 4, fixity: 'fixed-fixed' },
        { elasticModulus: 30e9, secondMoment: i, count: 2, fixity: 'fixed-pinned' },
      ],
    }).expect(200);
    expect(res.body.contributions[0]).toBeCloseTo(4 * 17_912_536.4, 0);
    expect(res.body.contributions[1]).toBeCloseTo((2 * 17_912_536.4) / 4, 0);
    expect(res.body.stiffness).toBeCloseTo(
      res.body.contributions[0] + res.body.contributions[1],
      6,
    );
  });

  it.each([
    [
      {
        height: 0,
        columns: [{ elasticModulus: 1, secondMoment: 1, count: 1, fixity: 'fixed-fixed' }],
      },
      'height must be a positive number (m)',
    ],
    [{ height: 3, columns: [] }, 'columns must list at least one column group'],
    [
      { height: 3, columns: [{ elasticModulus: 1, secondMoment: 1, count: 1, fixity: 'hinged' }] },
      'columns[0].fixity must be "fixed-fixed" or "fixed-pinned"',
    ],
    [
      {
        height: 3,
        columns: [{ elasticModulus: -1, secondMoment: 1, count: 1, fixity: 'fixed-fixed' }],
      },
      'columns[0].elasticModulus must be a positive number (Pa)',
    ],
  ])('refuses %j naming the field', async (body, message) => {
    const res = await post(body).expect(400);
    expect(res.body.message).toContain(message);
  });
});
