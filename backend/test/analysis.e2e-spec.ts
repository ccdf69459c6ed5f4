import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { ENGINE_VERSION } from '../src/analysis/engine/analyse';
import type { App } from 'supertest/types';
import { createTestApp, tokenFor } from './support/test-app';

const storey = { mass: 250000, stiffness: 3.5e8, height: 3.5 };
const valid = () => ({
  storeys: [storey, storey, storey, { ...storey, mass: 180000 }, { ...storey, mass: 150000 }],
  spectrum: {
    points: [
      { period: 0, sa: 0.4 },
      { period: 0.12, sa: 1.0 },
      { period: 0.6, sa: 1.0 },
      { period: 4, sa: 0.15 },
    ],
    interpolation: 'linear',
  },
  dampingRatio: 0.05,
});

describe('POST /api/analysis', () => {
  let app: INestApplication<App>;
  let token: string;
  const post = (body: unknown) =>
    request(app.getHttpServer())
      .post('/api/analysis')
      .set('Authorization', `Bearer ${token}`)
      .send(body as object);

  beforeAll(async () => {
    app = await createTestApp();
    token = await tokenFor(app, 'student');
  });
  afterAll(() => app.close());

  it('returns the fields of the API contract to any signed-in user', async () => {
    const res = await post(valid()).expect(200);
    const body = res.body;
    expect(body.totalMass).toBe(1_080_000);
    expect(body.modes).toHaveLength(5);
    expect(Object.keys(body.modes[0]).sort()).toEqual(
      [
        'circularFrequency',
        'cumulativeMassRatio',
        'effectiveMass',
        'effectiveMassRatio',
        'frequency',
        'number',
        'participationFactor',
        'period',
        'response',
        'sa',
        'shape',
        'shapeNormalisation',
        'normalisationLevel',
      ].sort(),
    );
    expect(Object.keys(body.modes[0].response).sort()).toEqual([
      'baseShear',
      'displacement',
      'drift',
      'floorForce',
      'overturningMoment',
      'storeyShear',
    ]);
    for (const method of ['srss', 'cqc', 'abs']) {
      expect(Object.keys(body.combined[method]).sort()).toEqual([
        'baseMoment',
        'baseShear',
        'displacement',
        'drift',
        'driftRatio',
        'floorForce',
        'overturningMoment',
        'storeyShear',
      ]);
      expect(body.combined[method].storeyShear).toHaveLength(5);
    }
    expect(body.modes[0].shape[4]).toBe(1);
    expect(body.correlation).toHaveLength(5);
    expect(Array.isArray(body.warnings)).toBe(true);
    expect(body.engineVersion).toBe(ENGINE_VERSION);
    expect(body.modes[4].cumulativeMassRatio).toBeCloseTo(1, 12);
  });

  it('uses only the first modeCount modes', async () => {
    const res = await post({ ...valid(), modeCount: 2 }).expect(200);
    expect(res.body.modes).toHaveLength(2);
    expect(res.body.correlation).toHaveLength(2);
  });

  it('refuses a caller who is not signed in', async () => {
    await request(app.getHttpServer()).post('/api/analysis').send(valid()).expect(401);
  });

  const withStorey = (index: number, change: object) => {
    const body = valid();
    body.storeys[index] = { ...body.storeys[index], ...change };
    return body;
  };
  const cases: [string, unknown, string][] = [
    [
      'a zero mass',
      withStorey(2, { mass: 0 }),
      'storeys[2].mass (storey 3) must be a positive number (kg)',
    ],
    [
      'a negative stiffness',
      withStorey(0, { stiffness: -1 }),
      'storeys[0].stiffness (storey 1) must be a positive number (N/m)',
    ],
    [
      'a number written as a string',
      withStorey(1, { height: '3.5' }),
      'storeys[1].height (storey 2) must be a number (m)',
    ],
    [
      'a NaN-like string',
      withStorey(4, { mass: 'NaN' }),
      'storeys[4].mass (storey 5) must be a number (kg)',
    ],
    [
      'a missing field',
      withStorey(3, { stiffness: undefined }),
      'storeys[3].stiffness (storey 4) must be a number (N/m)',
    ],
    [
      'an unknown storey field',
      withStorey(0, { colour: 'red' }),
      'property storeys[0].colour (storey 1) should not exist',
    ],
    [
      'a label that is not text',
      withStorey(1, { label: 7 }),
      'storeys[1].label (storey 2) must be text',
    ],
    [
      'a label of 61 characters',
      withStorey(2, { label: 'L'.repeat(61) }),
      'storeys[2].label (storey 3) must be at most 60 characters',
    ],
    ['no storeys', { ...valid(), storeys: [] }, 'storeys must have at least one storey'],
    [
      '501 storeys',
      { ...valid(), storeys: Array.from({ length: 501 }, () => storey) },
      'storeys must have at most 500 storeys',
    ],
    [
      'storeys that are not a list',
      { ...valid(), storeys: 'five' },
      'storeys must be a list of { mass, stiffness, height }',
    ],
    [
      'a one-point spectrum',
      { ...valid(), spectrum: { points: [{ period: 0, sa: 1 }] } },
      'spectrum.points must have at least two points',
    ],
    [
      'unsorted spectrum periods',
      {
        ...valid(),
        spectrum: {
          points: [
            { period: 0, sa: 1 },
            { period: 1, sa: 1 },
            { period: 0.5, sa: 1 },
          ],
        },
      },
      'spectrum.points[2].period (point 3) must be greater than the period of point 2',
    ],
    [
      'a negative spectral value',
      {
        ...valid(),
        spectrum: {
          points: [
            { period: 0, sa: 1 },
            { period: 1, sa: -0.1 },
          ],
        },
      },
      'spectrum.points[1].sa (point 2) must be a number >= 0 (g)',
    ],
    [
      'an unknown interpolation',
      { ...valid(), spectrum: { ...valid().spectrum, interpolation: 'cubic' } },
      'spectrum.interpolation must be "linear" or "log-log"',
    ],
    ['a missing spectrum', { ...valid(), spectrum: undefined }, 'spectrum must be given'],
    ['damping 0', { ...valid(), dampingRatio: 0 }, 'dampingRatio must be greater than 0'],
    ['damping 1', { ...valid(), dampingRatio: 1 }, 'dampingRatio must be less than 1'],
    [
      'a missing damping ratio',
      { ...valid(), dampingRatio: undefined },
      'dampingRatio must be a number (a fraction of critical, e.g. 0.05)',
    ],
    ['an unknown top-level field', { ...valid(), units: 'US' }, 'property units should not exist'],
    [
      'more modes than storeys',
      { ...valid(), modeCount: 6 },
      'modeCount must be a whole number from 1 to 5 (the number of storeys)',
    ],
    ['a fractional mode count', { ...valid(), modeCount: 2.5 }, 'modeCount must be a whole number'],
    [
      'values too large for double precision',
      withStorey(0, { stiffness: 1e308, mass: 1e-300 }),
      'the storey masses and stiffnesses are too far apart in size to analyse in double precision',
    ],
  ];

  it.each(cases)('refuses %s with 400 naming the field', async (_, body, message) => {
    const res = await post(body).expect(400);
    expect(res.body.statusCode).toBe(400);
    expect(res.body.message).toContain(message);
  });

  it('refuses a prototype-pollution key and pollutes nothing', async () => {
    const json = JSON.stringify(valid()).replace(/^\{/, '{"__proto__": {"polluted": true}, ');
    const res = await request(app.getHttpServer())
      .post('/api/analysis')
      .set('Authorization', `Bearer ${token}`)
      .set('Content-Type', 'application/json')
      .send(json);
    expect(res.status).toBe(400);
    expect(res.body.message[0]).toMatch(/field named "__proto__", which is not allowed/);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });

  it('answers a body that is not an object with 400', async () => {
    const res = await request(app.getHttpServer())
      .post('/api/analysis')
      .set('Authorization', `Bearer ${token}`)
      .set('Content-Type', 'application/json')
      .send('[1, 2, 3]')
      .expect(400);
    expect(res.body.statusCode).toBe(400);
  });
});

describe('GET /api/verification', () => {
  let app: INestApplication<App>;

  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(() => app.close());

  it('lists every reference case with its source and the values the engine computes now', async () => {
    const token = await tokenFor(app, 'student');
    const res = await request(app.getHttpServer())
      .get('/api/verification')
      .set('Authorization', `Bearer ${token}`)
      .expect(200);
    // Issue 13: the page is the engine's public test record, at least 25 published cases.
    expect(res.body.length).toBeGreaterThanOrEqual(25);
    for (const reference of res.body) {
      expect(reference.pass).toBe(true);
      expect(reference.source).toEqual(expect.any(String));
      expect(reference.rows.length).toBeGreaterThan(0);
    }
    await request(app.getHttpServer()).get('/api/verification').expect(401);
  });
});
