import { MikroORM } from '@mikro-orm/knex';
import type { AnalysisResponse, ChecksResponse } from '@tiermode/shared-types';
import {
  ASCE_BASIS as ASCE,
  EN_BASIS as EN,
  sampleInputs,
  useSignedInApp,
} from './support/fixtures';

const { state, http, as } = useSignedInApp();

const checks = (basis: object, extra: object = {}) =>
  http()
    .post('/api/checks')
    .set(as('designer'))
    .send({ ...sampleInputs(), basis, ...extra });

describe('POST /api/checks', () => {
  it('compares the modal base shear with ELF, scales by V / Vt, and checks every storey', async () => {
    const res = await checks(ASCE).expect(200);
    const body = res.body as ChecksResponse;
    const analysis = (
      await http().post('/api/analysis').set(as('designer')).send(sampleInputs()).expect(200)
    ).body as AnalysisResponse;
    // Vt = the CQC base shear / (R/Ie) (12.9.1.2); scale = max(1, V / Vt) (12.9.1.4.1).
    expect(body.modalBaseShear).toBeCloseTo(analysis.combined.cqc.baseShear / 8, 6);
    expect(body.scaleFactor).toBeCloseTo(Math.max(1, body.elf.baseShear / body.modalBaseShear), 12);
    expect(body.elf.csGoverns).toMatch(/^Eq\. 12\.8-/);
    expect(body.storeys).toHaveLength(3);
    const h = sampleInputs().storeys[0].height;
    // Design drift = drift / (R/Ie) x Cd / Ie, times the drift scale (12.8.6, 12.9.1.4.2).
    expect(body.storeys[0].designDriftRatio).toBeCloseTo(
      ((analysis.combined.cqc.drift[0] / 8) * 5.5 * body.driftScaleFactor) / h,
      12,
    );
    expect(body.storeys[0].driftLimitRatio).toBe(0.02);
    expect(Array.isArray(body.irregularities)).toBe(true);
  });

  it('runs the EN 1998-1 and user-defined bases', async () => {
    const en = (await checks(EN).expect(200)).body as ChecksResponse;
    expect(en.scaleFactor).toBe(1);
    expect(en.storeys[0].driftLimitRatio).toBe(0.0075);
    const user = (
      await checks({
        code: 'USER',
        scaleFactor: 1.2,
        driftLimitRatio: 0.015,
        deflectionAmplification: 4,
        stabilityLimit: 0.2,
      }).expect(200)
    ).body as ChecksResponse;
    expect(user.scaleFactor).toBe(1.2);
    expect(user.storeys[0].driftLimitRatio).toBe(0.015);
  });

  it.each([
    [
      'R = 0',
      { ...ASCE, r: 0 },
      'basis.r must be a positive number (the response modification coefficient)',
    ],
    ['a negative SDS', { ...ASCE, sds: -0.5 }, 'basis.sds must be a positive number (g)'],
    [
      'an unknown risk category',
      { ...ASCE, riskCategory: 'V' },
      'basis.riskCategory must be one of I, II, III, IV',
    ],
    [
      'an unknown ground type',
      { ...EN, groundType: 'F' },
      'basis.groundType must be one of A, B, C, D, E',
    ],
    ['nu above 1', { ...EN, nu: 2 }, 'basis.nu must be at most 1'],
    ['an unknown code', { code: 'NBC' }, 'basis.code must be one of ASCE7-22, EN1998-1, USER'],
    [
      'seismic weights of the wrong length',
      { ...ASCE, seismicWeights: [1, 2] },
      'basis.seismicWeights must have one value per storey (3)',
    ],
    [
      'seismic masses of the wrong length',
      { ...EN, seismicMasses: [1] },
      'basis.seismicMasses must have one value per storey (3)',
    ],
    [
      'a negative seismic mass',
      { ...EN, seismicMasses: [1, -2, 3] },
      'basis.seismicMasses must be a list of positive numbers (kg)',
    ],
  ])('refuses %s, naming the field', async (_what, basis, message) => {
    const res = await checks(basis).expect(400);
    expect(res.body.message as string[]).toContain(message);
  });

  it('refuses a missing basis and an unknown combination', async () => {
    const none = await http()
      .post('/api/checks')
      .set(as('designer'))
      .send(sampleInputs())
      .expect(400);
    expect(none.body.message).toContain('basis must be given');
    const combination = await checks(ASCE, { combination: 'abs' }).expect(400);
    expect(combination.body.message).toContain('combination must be "cqc" or "srss"');
  });

  const USER = {
    code: 'USER',
    scaleFactor: 1,
    driftLimitRatio: 0.02,
    deflectionAmplification: 4,
    stabilityLimit: 0.1,
  };
  const NO_BASE_SHEAR =
    'spectrum gives no base shear: Sa is zero at the periods of every mode, so the code-basis checks cannot be made; check the spectrum table';

  it.each([
    [
      'zero everywhere',
      [
        { period: 0, sa: 0 },
        { period: 4, sa: 0 },
      ],
    ],
    // Non-zero only at periods shorter than any of the building's modes (T1 of the sample
    // building is about 0.5 s; its highest mode is well above 0.01 s).
    [
      'zero at every mode period',
      [
        { period: 0, sa: 0.4 },
        { period: 0.005, sa: 0.4 },
        { period: 0.01, sa: 0 },
        { period: 4, sa: 0 },
      ],
    ],
  ])(
    'answers a spectrum %s with a 400 saying so, in every basis (it once gave nulls)',
    async (_, points) => {
      for (const basis of [ASCE, EN, USER]) {
        const res = await checks(basis, { spectrum: { points } }).expect(400);
        expect(res.body.message).toEqual([NO_BASE_SHEAR]);
      }
    },
  );
});

describe('Checks stored with a saved calc', () => {
  it('keeps the basis, stores the checks when analysed, and seals them with the calc', async () => {
    const project = await http()
      .post('/api/projects')
      .set(as('designer'))
      .send({ name: 'Checked' });
    const calc = await http()
      .post(`/api/projects/${project.body.id}/calculations`)
      .set(as('designer'))
      .send({ title: 'With checks', inputs: sampleInputs() })
      .expect(201);
    const bad = await http()
      .patch(`/api/calculations/${calc.body.id}`)
      .set(as('designer'))
      .send({ version: calc.body.version, basis: { ...ASCE, r: 0 } })
      .expect(400);
    expect(bad.body.message).toContain(
      'basis.r must be a positive number (the response modification coefficient)',
    );
    const withBasis = await http()
      .patch(`/api/calculations/${calc.body.id}`)
      .set(as('designer'))
      .send({ version: calc.body.version, basis: ASCE })
      .expect(200);
    expect(withBasis.body).toMatchObject({
      basis: { code: 'ASCE7-22' },
      checks: null,
      analysisStale: true,
    });
    await http().post(`/api/calculations/${calc.body.id}/analyse`).set(as('designer')).expect(200);
    const analysed = await http().get(`/api/calculations/${calc.body.id}`).set(as('designer'));
    expect(analysed.body.checks.code).toBe('ASCE7-22');
    expect(analysed.body.checks.storeys).toHaveLength(3);
    await http().post(`/api/calculations/${calc.body.id}/submit`).set(as('designer')).expect(200);
    await http()
      .post(`/api/calculations/${calc.body.id}/lock`)
      .set(as('reviewer'))
      .send({ statement: 'Accepted with its checks.' })
      .expect(200);
    expect(
      (await http().get(`/api/calculations/${calc.body.id}/seal`).set(as('reviewer'))).body.valid,
    ).toBe(true);
    await state.app
      .get(MikroORM)
      .em.getConnection()
      .execute(
        `update calculations set checks = json_set(checks, '$.scaleFactor', 0.5) where id = ?`,
        [calc.body.id],
      );
    expect(
      (await http().get(`/api/calculations/${calc.body.id}/seal`).set(as('reviewer'))).body.valid,
    ).toBe(false);
  });
});

describe('The code basis and the spectrum it is checked with', () => {
  /** A generated spectrum as a calc's inputs hold it: points, interpolation and source. */
  const generated = async (body: object) => {
    const g = (
      await http().post('/api/spectra/generate').set(as('designer')).send(body).expect(200)
    ).body as { points: unknown[]; interpolation: string; source: object };
    return { points: g.points, interpolation: g.interpolation, source: g.source };
  };

  it('says nothing when the basis has the values the spectrum was generated with', async () => {
    const g = await generated({ kind: 'asce7-two-period', sds: 1.0, sd1: 0.6, tl: 8, s1: 0.6 });
    expect(g.source).toEqual({
      kind: 'asce7-two-period',
      parameters: { sds: 1.0, sd1: 0.6, tl: 8, s1: 0.6 },
    });
    const body = (await checks(ASCE, { spectrum: g }).expect(200)).body as ChecksResponse;
    expect(body.warnings).toEqual([]);
  });

  it('warns, naming both values, when the basis SDS is not the spectrum source SDS', async () => {
    const g = await generated({ kind: 'asce7-two-period', sds: 1.2, sd1: 0.6, tl: 8 });
    const body = (await checks(ASCE, { spectrum: g }).expect(200)).body as ChecksResponse;
    expect(body.warnings).toEqual([
      expect.stringContaining(
        'The code basis has SDS 1 g but the design spectrum was generated with SDS 1.2 g',
      ),
    ]);
  });

  it('warns when the spectrum belongs to another code, or is EN 1998-1 elastic under the EN basis', async () => {
    const en = await generated({
      kind: 'en1998-design',
      agR: 0.25,
      groundType: 'C',
      spectrumType: 1,
      q: 3.9,
    });
    const mixed = (await checks(ASCE, { spectrum: en }).expect(200)).body as ChecksResponse;
    expect(mixed.warnings?.[0]).toContain('the checks would mix two codes');
    const agreed = (await checks(EN, { spectrum: en }).expect(200)).body as ChecksResponse;
    expect(agreed.warnings).toEqual([]);
    const elastic = await generated({
      kind: 'en1998-elastic',
      agR: 0.25,
      groundType: 'C',
      spectrumType: 1,
    });
    const body = (await checks(EN, { spectrum: elastic }).expect(200)).body as ChecksResponse;
    expect(body.warnings).toEqual([
      expect.stringContaining('the EN 1998-1 checks take the design spectrum with q (3.2.2.5)'),
    ]);
  });

  it('reads ag as gamma_I agR (EN 1998-1 3.2.1(3)) when comparing', async () => {
    const en = await generated({
      kind: 'en1998-design',
      agR: 0.25,
      importanceFactor: 1.2,
      groundType: 'C',
      spectrumType: 1,
      q: 3.9,
    });
    const same = (
      await checks({ ...EN, ag: 0.3, importanceFactor: 1.2 }, { spectrum: en }).expect(200)
    ).body as ChecksResponse;
    expect(same.warnings).toEqual([]);
    const differs = (await checks(EN, { spectrum: en }).expect(200)).body as ChecksResponse;
    expect(differs.warnings).toEqual([
      expect.stringContaining('has ag 0.25 g but the design spectrum was generated with ag 0.3 g'),
      expect.stringContaining('has importance factor 1 but'),
    ]);
  });

  it('refuses an S1 below zero in the generator and in a stored source', async () => {
    const res = await http()
      .post('/api/spectra/generate')
      .set(as('designer'))
      .send({ kind: 'asce7-two-period', sds: 1, sd1: 0.6, tl: 8, s1: -0.1 })
      .expect(400);
    expect(res.body.message).toContain('s1 must be a number >= 0 (g)');
    const stored = await http()
      .post('/api/analysis')
      .set(as('designer'))
      .send({
        ...sampleInputs(),
        spectrum: {
          ...sampleInputs().spectrum,
          source: { kind: 'asce7-two-period', parameters: { sds: 1, sd1: 0.6, tl: 8, s1: -1 } },
        },
      })
      .expect(400);
    expect(JSON.stringify(stored.body.message)).toContain(
      'parameters.s1 must be a number >= 0 (g)',
    );
  });
});

describe('Design storey values beside the elastic ones', () => {
  it('ASCE 7-22: forces / (R/Ie) x the scale factor, displacements x Cd/Ie / (R/Ie) x the drift scale', async () => {
    const body = (await checks(ASCE).expect(200)).body as ChecksResponse;
    const analysis = (
      await http().post('/api/analysis').set(as('designer')).send(sampleInputs()).expect(200)
    ).body as AnalysisResponse;
    const design = body.design!;
    expect(design.analysisValues).toBe('elastic');
    expect(design.combination).toBe('cqc');
    // ASCE 7-22 12.9.1.2 and 12.9.1.4.1 with R = 8, Ie = 1 (the basis of this test).
    expect(design.forceFactor).toBeCloseTo(body.scaleFactor / 8, 14);
    // 12.8.6 and 12.9.1.2: Cd / Ie = 5.5 over R / Ie = 8.
    expect(design.displacementFactor).toBeCloseTo((5.5 / 8) * body.driftScaleFactor, 14);
    design.storeyShear.forEach((v, i) => {
      expect(v).toBeCloseTo((analysis.combined.cqc.storeyShear[i] / 8) * body.scaleFactor, 6);
      // The same design shear as the storey checks use.
      expect(v).toBeCloseTo(body.storeys[i].scaledShear, 6);
    });
    const h = sampleInputs().storeys.map((s) => s.height);
    design.drift.forEach((d, i) =>
      expect(d / h[i]).toBeCloseTo(body.storeys[i].designDriftRatio, 12),
    );
    expect(design.floorForce).toHaveLength(3);
    expect(design.overturningMoment[0]).toBeCloseTo(
      analysis.combined.cqc.overturningMoment[0] * design.forceFactor,
      4,
    );
  });

  it('EN 1998-1: the design spectrum gives the design forces; displacements x q (4.3.4)', async () => {
    const body = (await checks(EN).expect(200)).body as ChecksResponse;
    const design = body.design!;
    expect(design.analysisValues).toBe('design');
    expect(design.forceFactor).toBe(1);
    expect(design.displacementFactor).toBe(3.9);
    expect(design.explanation).toContain('4.3.4');
  });

  it('follows the combination the checks use', async () => {
    const body = (await checks(ASCE, { combination: 'srss' }).expect(200)).body as ChecksResponse;
    expect(body.design?.combination).toBe('srss');
  });
});
