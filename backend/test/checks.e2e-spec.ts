import { MikroORM } from '@mikro-orm/sqlite';
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
