import type { AnalysisRequest, AnalysisResponse, CalculationDto } from '@tiermode/shared-types';
import fc from 'fast-check';
import {
  ASCE_BASIS as ASCE,
  EN_BASIS as EN,
  sampleInputs,
  useSignedInApp,
} from './support/fixtures';

/**
 * Property-based: generated payloads (valid, boundary and malformed) against POST /api/analysis,
 * POST /api/checks and PATCH /api/calculations/:id. Valid ones are answered 200 and the answer
 * keeps the engine's invariants; malformed ones are refused with a 4xx error body; boundary ones
 * (legal types, extreme values) get either; nothing gets a 5xx, and the server still answers
 * /api/health at the end. 1,150 payloads in all; a failure prints fast-check's seed and the
 * smallest failing payload.
 */
const { http, as } = useSignedInApp();
let sent = 0;

// The same payloads on every run, so CI is repeatable; FC_SEED=random (or a number) explores.
const seed =
  process.env.FC_SEED === 'random' ? Date.now() % 2 ** 31 : Number(process.env.FC_SEED ?? 20261202);
fc.configureGlobal({ seed });
beforeAll(() => console.log(`fast-check seed ${seed} (set FC_SEED to repeat or change it)`));

// ---------- valid payloads ----------

const storey = fc.record({
  mass: fc.double({ min: 1e3, max: 1e7, noNaN: true }),
  stiffness: fc.double({ min: 1e6, max: 1e11, noNaN: true }),
  height: fc.double({ min: 2, max: 8, noNaN: true }),
});

/** A design spectrum: periods from 0, strictly increasing; Sa from 0.05 to 3 g. */
const spectrum = fc
  .array(
    fc.record({
      step: fc.double({ min: 0.01, max: 2, noNaN: true }),
      sa: fc.double({ min: 0.05, max: 3, noNaN: true }),
    }),
    { minLength: 2, maxLength: 12 },
  )
  .map((points) => {
    let period = 0;
    return points.map(({ step, sa }, i) => {
      if (i > 0) period += step;
      return { period, sa };
    });
  });

const validRequest: fc.Arbitrary<AnalysisRequest> = fc
  .record({
    storeys: fc.array(storey, { minLength: 1, maxLength: 15 }),
    points: spectrum,
    interpolation: fc.constantFrom('linear' as const, 'log-log' as const, undefined),
    dampingRatio: fc.double({ min: 0.005, max: 0.3, noNaN: true }),
  })
  .map(({ storeys, points, interpolation, dampingRatio }) => ({
    storeys,
    spectrum: interpolation ? { points, interpolation } : { points },
    dampingRatio,
  }));

const relativeClose = (a: number, b: number, tolerance: number) =>
  Math.abs(a - b) <= tolerance * Math.max(1, Math.abs(a), Math.abs(b));

/** What every analysis must satisfy, whatever the building (Chopra, Dynamics of Structures, chs. 10 and 13). */
function expectEngineInvariants(request: AnalysisRequest, result: AnalysisResponse): void {
  const n = request.storeys.length;
  const masses = request.storeys.map((s) => s.mass);
  expect(JSON.stringify(result)).not.toMatch(/null|NaN|Infinity/);
  expect(result.totalMass).toBeCloseTo(
    masses.reduce((a, b) => a + b, 0),
    -Math.log10(result.totalMass) + 9,
  );
  expect(result.availableModes).toBe(n);
  expect(result.modes.length).toBeGreaterThanOrEqual(1);
  expect(result.modes.length).toBeLessThanOrEqual(n);
  result.modes.forEach((mode, i) => {
    expect(mode.period).toBeGreaterThan(0);
    // Periods fall with mode number; omega = 2 pi / T.
    if (i > 0) expect(mode.period).toBeLessThanOrEqual(result.modes[i - 1].period * (1 + 1e-9));
    expect(relativeClose(mode.circularFrequency * mode.period, 2 * Math.PI, 1e-9)).toBe(true);
    expect(mode.shape).toHaveLength(n);
    expect(mode.effectiveMassRatio).toBeGreaterThanOrEqual(0);
    expect(mode.effectiveMassRatio).toBeLessThanOrEqual(1 + 1e-9);
    expect(mode.cumulativeMassRatio).toBeLessThanOrEqual(1 + 1e-9);
  });
  // Mode shapes are orthogonal through the mass matrix: phi_i' M phi_j = 0 for i != j.
  for (let i = 0; i < result.modes.length; i += 1) {
    for (let j = 0; j < i; j += 1) {
      const [a, b] = [result.modes[i].shape, result.modes[j].shape];
      const cross = a.reduce((sum, ak, k) => sum + masses[k] * ak * b[k], 0);
      const norm = Math.sqrt(
        a.reduce((s, ak, k) => s + masses[k] * ak * ak, 0) *
          b.reduce((s, bk, k) => s + masses[k] * bk * bk, 0),
      );
      expect(Math.abs(cross) / norm).toBeLessThan(1e-6);
    }
  }
  if (result.modes.length === n) {
    // With every mode kept the effective masses add up to the total mass.
    expect(relativeClose(result.modes[n - 1].cumulativeMassRatio, 1, 1e-6)).toBe(true);
  }
  const { srss, cqc, abs } = result.combined;
  for (const combined of [srss, cqc, abs]) {
    expect(combined.baseShear).toBeGreaterThanOrEqual(0);
    expect(combined.storeyShear).toHaveLength(n);
  }
  // No combination exceeds the sum of absolute values.
  expect(srss.baseShear).toBeLessThanOrEqual(abs.baseShear * (1 + 1e-9));
  expect(cqc.baseShear).toBeLessThanOrEqual(abs.baseShear * (1 + 1e-9));
  // The correlation coefficients are 1 on the diagonal and lie in [0, 1].
  result.correlation.forEach((row, i) =>
    row.forEach((rho, j) => {
      expect(rho).toBeGreaterThanOrEqual(-1e-12);
      expect(rho).toBeLessThanOrEqual(1 + 1e-12);
      if (i === j) expect(rho).toBeCloseTo(1, 12);
    }),
  );
}

// ---------- malformed and boundary payloads ----------

/** Values that are never a number of the right kind. */
const junk = fc.oneof(
  fc.string({ maxLength: 20 }),
  fc.constant('x'.repeat(200_000)),
  fc.boolean(),
  fc.constant(null),
  fc.array(fc.anything({ maxDepth: 3 }), { maxLength: 4 }),
  fc.dictionary(fc.string({ maxLength: 8 }), fc.anything({ maxDepth: 3 }), { maxKeys: 4 }),
  fc.constant(-1),
  fc.constant(0),
  fc.constant(-1e308),
);

/** Legal in type, extreme in value: refused with a named field, or analysed. */
const extreme = fc.constantFrom(
  1e308,
  Number.MAX_VALUE,
  5e-324,
  1e-300,
  1e300,
  Number.MAX_SAFE_INTEGER + 2,
);

type Path = (string | number)[];

function setAt(value: unknown, path: Path, replacement: unknown): unknown {
  if (path.length === 0) return replacement;
  const copy = (Array.isArray(value) ? [...value] : { ...(value as object) }) as Record<
    string | number,
    unknown
  >;
  copy[path[0]] = setAt(copy[path[0]], path.slice(1), replacement);
  return copy;
}

/** A path into a valid request: the root fields, a storey's field, a spectrum point's field. */
function pathsOf(request: AnalysisRequest): fc.Arbitrary<Path> {
  const n = request.storeys.length;
  const m = request.spectrum.points.length;
  return fc.oneof(
    fc.constantFrom<Path>(
      ['storeys'],
      ['spectrum'],
      ['spectrum', 'points'],
      ['spectrum', 'interpolation'],
      ['dampingRatio'],
      ['modeCount'],
      ['targetMassRatio'],
    ),
    fc
      .tuple(
        fc.integer({ min: 0, max: n - 1 }),
        fc.constantFrom('mass', 'stiffness', 'height', 'label'),
      )
      .map(([i, f]): Path => ['storeys', i, f]),
    fc
      .tuple(fc.integer({ min: 0, max: m - 1 }), fc.constantFrom('period', 'sa'))
      .map(([j, f]): Path => ['spectrum', 'points', j, f]),
  );
}

/** JSON text of a request with one field made wrong; every one must be refused. */
const malformedJson = fc.oneof(
  // One field replaced by junk.
  validRequest.chain((request) =>
    fc.tuple(pathsOf(request), junk).map(([path, value]) => {
      // Junk only where it is wrong: a label may be any short text, and a period or an Sa of 0
      // is a real point of a spectrum.
      const field = path.at(-1);
      const replaced =
        field === 'label' && typeof value === 'string' && value.length <= 60
          ? 42
          : (field === 'period' || field === 'sa') && value === 0
            ? -1
            : value;
      return JSON.stringify(setAt(request, path, replaced));
    }),
  ),
  // A required field missing.
  validRequest.chain((request) =>
    fc.constantFrom('storeys', 'spectrum', 'dampingRatio').map((key) => {
      const copy: Record<string, unknown> = { ...request };
      delete copy[key];
      return JSON.stringify(copy);
    }),
  ),
  // A field nobody asked for, nested anywhere.
  validRequest.chain((request) =>
    fc
      .tuple(
        fc.constantFrom<Path>([], ['spectrum'], ['storeys', 0]),
        fc.string({ minLength: 1, maxLength: 10 }),
      )
      .filter(
        ([, key]) =>
          !['label', 'mass', 'stiffness', 'height', 'points', 'interpolation'].includes(key),
      )
      .map(([path, key]) => {
        const target = path.reduce<Record<string | number, unknown>>(
          (o, k) => o[k] as Record<string | number, unknown>,
          request as never,
        );
        return JSON.stringify(setAt(request, path, { ...target, [`x-${key}`]: 1 }));
      }),
  ),
  // Keys that could reach a prototype, written into the JSON text itself.
  validRequest.chain((request) =>
    fc
      .tuple(
        fc.constantFrom('__proto__', 'constructor', 'prototype'),
        fc.constantFrom('root', 'spectrum', 'storey'),
      )
      .map(([key, where]) => {
        const text = JSON.stringify(request);
        const pollution = `"${key}":{"isAdmin":true,"polluted":1},`;
        if (where === 'root') return `{${pollution}${text.slice(1)}`;
        if (where === 'spectrum') return text.replace('"spectrum":{', `"spectrum":{${pollution}`);
        return text.replace('"storeys":[{', `"storeys":[{${pollution}`);
      }),
  ),
  // The spectrum's periods out of order, or too many storeys.
  validRequest
    .filter((r) => r.spectrum.points.length >= 2)
    .map((r) => JSON.stringify({ ...r, spectrum: { points: [...r.spectrum.points].reverse() } })),
  fc.constant(
    JSON.stringify({ ...sampleInputs(), storeys: Array(501).fill(sampleInputs().storeys[0]) }),
  ),
  // Not a request at all: any JSON value, or text that is not JSON.
  fc.jsonValue({ maxDepth: 4 }).map((value) => JSON.stringify(value)),
  fc.string({ maxLength: 40 }).map((s) => `{"storeys": ${s}`),
);

const boundaryRequest = validRequest.chain((request) =>
  fc.tuple(pathsOf(request), extreme).map(([path, value]) => setAt(request, path, value)),
);

function expectRefused(res: { status: number; body: unknown }, payload: string): void {
  if (res.status < 400 || res.status > 499) {
    throw new Error(`Expected a 4xx for ${payload.slice(0, 300)}, got ${res.status}`);
  }
  const body = res.body as { statusCode: number; message: string[] };
  expect(body.statusCode).toBe(res.status);
  expect(body.message.length).toBeGreaterThan(0);
  for (const line of body.message) expect(typeof line).toBe('string');
}

function expectNo5xx(res: { status: number }, payload: unknown): void {
  if (res.status >= 500) {
    throw new Error(`${res.status} for ${JSON.stringify(payload).slice(0, 300)}`);
  }
}

const post = async (url: string, json: string) => {
  sent += 1;
  return http().post(url).set(as('designer')).set('Content-Type', 'application/json').send(json);
};

// A prototype reached through a payload would show here.
afterEach(() => expect(({} as Record<string, unknown>).polluted).toBeUndefined());

describe('POST /api/analysis, with generated payloads', () => {
  it('answers every valid building with results that keep the engine invariants (250)', async () => {
    await fc.assert(
      fc.asyncProperty(validRequest, async (request) => {
        const res = await post('/api/analysis', JSON.stringify(request));
        expect(res.status).toBe(200);
        expectEngineInvariants(request, res.body as AnalysisResponse);
      }),
      { numRuns: 250 },
    );
  });

  it('refuses every malformed payload with a 4xx naming the problem (300)', async () => {
    await fc.assert(
      fc.asyncProperty(malformedJson, async (json) => {
        expectRefused(await post('/api/analysis', json), json);
      }),
      { numRuns: 300 },
    );
  });

  it('answers extreme values with a named refusal or with sound results, never a 5xx (100)', async () => {
    await fc.assert(
      fc.asyncProperty(boundaryRequest, async (request) => {
        const res = await post('/api/analysis', JSON.stringify(request));
        expectNo5xx(res, request);
        if (res.status === 200) {
          expectEngineInvariants(request as AnalysisRequest, res.body as AnalysisResponse);
        } else {
          expectRefused(res, JSON.stringify(request));
        }
      }),
      { numRuns: 100 },
    );
  });
});

const basis = fc.oneof(
  fc
    .record({
      sds: fc.double({ min: 0.1, max: 2, noNaN: true }),
      r: fc.double({ min: 1, max: 8, noNaN: true }),
    })
    .map((v) => ({ ...ASCE, ...v, sd1: v.sds * 0.6 })),
  fc
    .record({
      ag: fc.double({ min: 0.05, max: 0.5, noNaN: true }),
      q: fc.double({ min: 1, max: 5, noNaN: true }),
    })
    .map((v) => ({ ...EN, ...v })),
  fc.record({ scaleFactor: fc.double({ min: 0.5, max: 2, noNaN: true }) }).map((v) => ({
    code: 'USER',
    ...v,
    driftLimitRatio: 0.02,
    deflectionAmplification: 4,
    stabilityLimit: 0.1,
  })),
);

describe('POST /api/checks, with generated payloads', () => {
  it('checks every valid building against its basis, one storey check per storey (150)', async () => {
    await fc.assert(
      fc.asyncProperty(validRequest, basis, async (request, b) => {
        const res = await post('/api/checks', JSON.stringify({ ...request, basis: b }));
        expect(res.status).toBe(200);
        expect(res.body.code).toBe(b.code);
        expect(res.body.storeys).toHaveLength(request.storeys.length);
        expect(JSON.stringify(res.body)).not.toMatch(/NaN|Infinity/);
        expect(res.body.scaleFactor).toBeGreaterThan(0);
      }),
      { numRuns: 150 },
    );
  });

  it('refuses malformed requests and malformed bases with a 4xx (150)', async () => {
    const badBasis = fc.oneof(
      junk,
      basis.chain((b) =>
        fc
          .tuple(fc.constantFrom(...Object.keys(b).filter((k) => k !== 'code')), junk)
          // 0 is a real value of some fields (S1 may be 0); -1 is wrong for all of them.
          .map(([key, value]) => ({ ...b, [key]: value === 0 ? -1 : value })),
      ),
      fc.constant({ code: 'NBC' }),
    );
    await fc.assert(
      fc.asyncProperty(
        fc.oneof(
          malformedJson.map((json) => json.replace(/^\{/, `{"basis":${JSON.stringify(ASCE)},`)),
          fc.tuple(validRequest, badBasis).map(([r, b]) => JSON.stringify({ ...r, basis: b })),
        ),
        async (json) => {
          expectRefused(await post('/api/checks', json), json);
        },
      ),
      { numRuns: 150 },
    );
  });
});

describe('PATCH /api/calculations/:id, with generated payloads', () => {
  let calc: CalculationDto;

  beforeAll(async () => {
    const project = await http()
      .post('/api/projects')
      .set(as('designer'))
      .send({ name: 'Generated edits' })
      .expect(201);
    calc = (
      await http()
        .post(`/api/projects/${project.body.id}/calculations`)
        .set(as('designer'))
        .send({ title: 'Generated', inputs: sampleInputs() })
        .expect(201)
    ).body as CalculationDto;
  });

  const patch = (body: string) => {
    sent += 1;
    return http()
      .patch(`/api/calculations/${calc.id}`)
      .set(as('designer'))
      .set('Content-Type', 'application/json')
      .send(body);
  };

  it('keeps every valid edit exactly as sent (100)', async () => {
    const title = fc
      .string({ minLength: 1, maxLength: 120, unit: 'grapheme' })
      .filter((t) => t.trim().length > 0 && t.trim() === t);
    await fc.assert(
      fc.asyncProperty(
        title,
        validRequest,
        fc.constantFrom('SI', 'US'),
        async (t, inputs, units) => {
          const res = await patch(
            JSON.stringify({ version: calc.version, title: t, inputs, displayUnits: units }),
          );
          expect(res.status).toBe(200);
          calc = res.body as CalculationDto;
          const stored = (await http().get(`/api/calculations/${calc.id}`).set(as('designer')))
            .body as CalculationDto;
          expect(stored.title).toBe(t);
          expect(stored.inputs).toEqual(inputs);
          expect(stored.displayUnits).toBe(units);
        },
      ),
      { numRuns: 100 },
    );
  });

  it('refuses every malformed edit with a 4xx and loses nothing already saved (100)', async () => {
    const badEdit = fc.oneof(
      malformedJson.map((json) => `{"version":${calc.version},"inputs":${json}}`),
      // A short non-blank string is a fine title, and null a fine basis (it removes it).
      junk
        .filter((v) => typeof v !== 'string' || v.trim() === '' || v.length > 200)
        .map((value) => JSON.stringify({ version: calc.version, title: value })),
      junk.map((value) => JSON.stringify({ version: value, title: 'x' })),
      junk.map((value) => JSON.stringify({ version: calc.version, displayUnits: value })),
      junk
        .filter((v) => v !== null)
        .map((value) => JSON.stringify({ version: calc.version, basis: value })),
      fc.constant(JSON.stringify({ version: calc.version - 1, title: 'stale' })),
      fc.constant(`{"version":${calc.version},"__proto__":{"polluted":1}}`),
    );
    const before = (await http().get(`/api/calculations/${calc.id}`).set(as('designer')))
      .body as CalculationDto;
    await fc.assert(
      fc.asyncProperty(badEdit, async (json) => {
        expectRefused(await patch(json), json);
      }),
      { numRuns: 100 },
    );
    const after = (await http().get(`/api/calculations/${calc.id}`).set(as('designer')))
      .body as CalculationDto;
    expect(after).toEqual(before);
  });
});

describe('after all of it', () => {
  it('has sent at least 1,000 generated payloads, and the server still answers /api/health', async () => {
    expect(sent).toBeGreaterThanOrEqual(1000);
    await http().get('/api/health').expect(200, { status: 'ok' });
  });
});
