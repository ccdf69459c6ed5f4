import { MikroORM } from '@mikro-orm/knex';
import type {
  AuditEventDto,
  CalculationChanges,
  CalculationDto,
  DemoRecordResponse,
  FreeVibrationResponse,
  RecordImportResponse,
  RecordSpectrumResponse,
  ResponseHistoryResponse,
  ResponseHistoryResult,
  ResponseHistorySetup,
  SealCheckResponse,
  WholeCalculationDto,
} from '@tiermode/shared-types';
import { pdfText } from './support/pdf-text';
import { binaryBody, calcInState, sampleInputs, useSignedInApp } from './support/fixtures';

const signedIn = useSignedInApp();
const { state, http, as } = signedIn;

const post = (path: string, body: object, role: 'designer' | 'student' = 'designer') =>
  http().post(path).set(as(role)).send(body);

const storeys = [
  { mass: 2e5, stiffness: 1.5e8, height: 3.5 },
  { mass: 2e5, stiffness: 1.5e8, height: 3.5 },
];

/** A short record in m/s2: a pulse and rest. */
const record = {
  timeStep: 0.01,
  units: 'm/s2' as const,
  accelerations: Array.from({ length: 301 }, (_, k) =>
    k <= 50 ? Math.sin((Math.PI * k) / 50) : 0,
  ),
};

describe('POST /api/free-vibration', () => {
  it('answers times, displacements per level, each mode and the peaks (students may try it too)', async () => {
    const res = await post(
      '/api/free-vibration',
      {
        storeys,
        dampingRatio: 0.02,
        initialDisplacements: [0.01, 0.02],
        duration: 2,
        timeStep: 0.01,
      },
      'student',
    ).expect(200);
    const body = res.body as FreeVibrationResponse;
    expect(body.times).toHaveLength(201);
    expect(body.displacements).toHaveLength(2);
    expect(body.displacements[1][0]).toBeCloseTo(0.02, 12);
    expect(body.modes).toHaveLength(2);
    // The modal coordinates add up to the displacement at every sample (roof shape +1).
    body.times.forEach((_, s) => {
      const sum = body.modes.reduce((total, mode) => total + mode.shape[1] * mode.coordinate[s], 0);
      expect(sum).toBeCloseTo(body.displacements[1][s], 12);
    });
    expect(body.peaks.displacement[1]).toBeCloseTo(0.02, 12);
  });

  it.each([
    [
      { initialDisplacements: [0.01] },
      'initialDisplacements must have one value per level (2), level 1 first',
    ],
    [
      { initialDisplacements: [0.01, 'x'] },
      'initialDisplacements[1] (level 2) must be a number (m)',
    ],
    [
      { initialDisplacements: [0, 0] },
      'initialDisplacements or initialVelocities must give the building a start',
    ],
    [
      { initialDisplacements: [0, 0.01], timeStep: 0 },
      'timeStep must be a number greater than 0 (s)',
    ],
    [{ initialDisplacements: [0, 0.01], duration: 1e6 }, 'at most 20001 are answered'],
    [
      { initialDisplacements: [0, 0.01], dampingRatio: -0.1 },
      'dampingRatio must be at least 0 and less than 1',
    ],
    [
      { initialDisplacements: [0, 0.01], storeys: [{ mass: -1, stiffness: 1, height: 1 }] },
      'storeys[0].mass (storey 1) must be a positive number',
    ],
  ])('refuses %j with 400 naming the field', async (change, message) => {
    const res = await post('/api/free-vibration', {
      storeys,
      dampingRatio: 0.05,
      duration: 1,
      timeStep: 0.01,
      ...change,
    }).expect(400);
    expect((res.body.message as string[]).join(' | ')).toContain(message);
  });

  it('needs a signed-in user', async () => {
    await http().post('/api/free-vibration').send({}).expect(401);
  });
});

describe('POST /api/response-history', () => {
  it('answers a peak per storey for each quantity, in SI, with their times and histories', async () => {
    const res = await post('/api/response-history', { storeys, dampingRatio: 0.05, record }).expect(
      200,
    );
    const body = res.body as ResponseHistoryResponse;
    for (const key of [
      'displacement',
      'drift',
      'driftRatio',
      'floorForce',
      'shear',
      'overturningMoment',
    ] as const) {
      expect(body.peaks[key]).toHaveLength(2);
      expect(body.peakTimes[key]).toHaveLength(2);
      body.peaks[key].forEach((value) => expect(value).toBeGreaterThan(0));
    }
    expect(body.peaks.shear[1]).toBeCloseTo(1.5e8 * body.peaks.drift[1], 3);
    expect(body.base.shear).toBe(body.peaks.shear[0]);
    expect(body.histories.decimated).toBe(false);
    expect(body.histories.roofDisplacement.values).toHaveLength(301);
    expect(body.record.peakGroundAcceleration).toBeCloseTo(1 / 9.80665, 9);
    expect(body.animation).toBeUndefined();
  });

  it('scales the record, and gives frames to draw on request', async () => {
    const once = (
      await post('/api/response-history', { storeys, dampingRatio: 0.05, record }).expect(200)
    ).body as ResponseHistoryResponse;
    const twice = (
      await post('/api/response-history', {
        storeys,
        dampingRatio: 0.05,
        record,
        scale: 2,
        animationFrames: 101,
      }).expect(200)
    ).body as ResponseHistoryResponse;
    expect(twice.peaks.displacement[1]).toBeCloseTo(2 * once.peaks.displacement[1], 12);
    expect(twice.animation!.times).toHaveLength(101);
    expect(twice.animation!.displacements).toHaveLength(2);
  });

  it.each([
    [
      { record: { ...record, accelerations: [0, 1, null] } },
      'record.accelerations[2] (sample 3, t = 0.02 s) must be a finite number (m/s2)',
    ],
    [{ record: { ...record, units: 'gal' } }, 'record.units must be one of g, m/s2, cm/s2'],
    [{ record: { ...record, timeStep: 1 } }, 'record.timeStep must be from 0.0001 to 0.1 s'],
    [{ record: undefined }, 'record must be given'],
    [{ modeCount: 3 }, 'modeCount must be a whole number from 1 to 2'],
    [{ scale: -1 }, 'scale must be a number greater than 0 and at most 100'],
    [
      { record: { ...record, accelerations: new Array(60_001).fill(0) } },
      'record.accelerations must have at most 60000 values',
    ],
  ])('refuses %j with 400 naming the field', async (change, message) => {
    const res = await post('/api/response-history', {
      storeys,
      dampingRatio: 0.05,
      record,
      ...change,
    }).expect(400);
    expect((res.body.message as string[]).join(' | ')).toContain(message);
  });
});

describe('POST /api/record-spectrum', () => {
  it('answers periods, Sa in g and Sd in m; Sa = omega^2 Sd / g', async () => {
    const res = await post('/api/record-spectrum', {
      record,
      dampingRatio: 0.05,
      periods: [0, 0.5, 1],
    }).expect(200);
    const body = res.body as RecordSpectrumResponse;
    expect(body.periods).toEqual([0, 0.5, 1]);
    expect(body.sa[0]).toBeCloseTo(1 / 9.80665, 9);
    expect(body.sd[0]).toBe(0);
    expect(body.sa[2]).toBeCloseTo(((2 * Math.PI) ** 2 * body.sd[2]) / 9.80665, 12);
  });

  it('refuses a negative period, naming it', async () => {
    const res = await post('/api/record-spectrum', {
      record,
      dampingRatio: 0.05,
      periods: [1, -2],
    }).expect(400);
    expect(res.body.message).toContain('periods[1] must be a number from 0 to 50 (s)');
  });
});

describe('Records: the demo and uploads', () => {
  it('gives the invented demo record, labelled so', async () => {
    const res = await http().get('/api/records/demo').set(as('student')).expect(200);
    const body = res.body as DemoRecordResponse;
    expect(body.record.origin).toBe('demo');
    expect(body.record.name).toMatch(/invented/i);
    expect(body.description).toMatch(/do not design with it/);
    expect(body.record.accelerations).toHaveLength(2001);
  });

  const upload = (text: string, fields: Record<string, string>, name = 'site-a.csv') => {
    let req = http()
      .post('/api/imports/record')
      .set(as('designer'))
      .attach('file', Buffer.from(text), name);
    for (const [key, value] of Object.entries(fields)) req = req.field(key, value);
    return req;
  };

  it('reads time and acceleration columns with a header, the step from the times', async () => {
    const res = await upload('time (s),acceleration (g)\n0,0\n0.02,0.1\n0.04,-0.05\n0.06,0\n', {
      units: 'g',
    }).expect(200);
    const body = res.body as RecordImportResponse;
    expect(body.record).toMatchObject({
      name: 'site-a',
      origin: 'upload',
      timeStep: 0.02,
      units: 'g',
    });
    expect(body.record!.accelerations).toEqual([0, 0.1, -0.05, 0]);
    expect(body.timeStepFrom).toContain('from the time column');
  });

  it('reads one column of plain text at the step given, and semicolons with decimal commas', async () => {
    const plain = (
      await upload(
        '0\n  12.5\n-3.25\n0\n',
        { units: 'cm/s2', timeStep: '0.005' },
        'quake.txt',
      ).expect(200)
    ).body as RecordImportResponse;
    expect(plain.record).toMatchObject({
      timeStep: 0.005,
      units: 'cm/s2',
      accelerations: [0, 12.5, -3.25, 0],
    });
    const comma = (await upload('0;0\n0,01;0,25\n0,02;-0,5\n', { units: 'm/s2' }).expect(200))
      .body as RecordImportResponse;
    expect(comma.record!.accelerations).toEqual([0, 0.25, -0.5]);
    expect(comma.record!.timeStep).toBe(0.01);
  });

  it('names the row of a bad value, an uneven time, and a missing step', async () => {
    const bad = await upload('t,a\n0,0\n0.01,abc\n0.02,0\n', { units: 'g' }).expect(400);
    expect((bad.body.message as string[])[0]).toMatch(/^Row 3, acceleration: /);
    const uneven = await upload('0,0\n0.01,0\n0.025,0\n0.03,0\n', { units: 'g' }).expect(400);
    expect((uneven.body.message as string[])[0]).toMatch(
      /^Row 3, time: 0.025 s is off the constant step/,
    );
    const noStep = await upload('0\n0.1\n0\n', { units: 'g' }).expect(400);
    expect((noStep.body.message as string[])[0]).toContain(
      'timeStep: One column of accelerations needs its time step',
    );
    // Gal read as g: refused, naming the row.
    const slip = await upload('0\n250\n0\n', { units: 'g', timeStep: '0.01' }).expect(400);
    expect((slip.body.message as string[])[0]).toBe(
      'Row 2, acceleration: 250 g is 250 g, more than 100 g: are the units right?',
    );
    const noUnits = await upload('0\n0.1\n0\n', { timeStep: '0.01' }).expect(400);
    expect(noUnits.body.message).toEqual([
      "units must be one of g, m/s2, cm/s2 (the record's accelerations)",
    ]);
  });
});

describe("A calc's response history", () => {
  async function withHistory(title: string, setup: Partial<ResponseHistorySetup> = {}) {
    const calc = await calcInState(signedIn, 'draft', title);
    const demo = (await http().get('/api/records/demo').set(as('designer')).expect(200))
      .body as DemoRecordResponse;
    const history: ResponseHistorySetup = {
      record: demo.record,
      scaling: { method: 'spectrum', rule: 'mean', periodRange: [0.1, 1.5] },
      freeVibration: {
        start: { kind: 'mode', mode: 1, amplitude: 0.05 },
        duration: 5,
        timeStep: 0.01,
      },
      ...setup,
    };
    const res = await http()
      .patch(`/api/calculations/${calc.id}`)
      .set(as('designer'))
      .send({ version: calc.version, history })
      .expect(200);
    return res.body as CalculationDto;
  }

  /** A calc with the response history above, analysed and submitted for review. */
  async function submittedWithHistory(title: string) {
    const calc = await withHistory(title);
    await http().post(`/api/calculations/${calc.id}/analyse`).set(as('designer')).expect(200);
    await http().post(`/api/calculations/${calc.id}/submit`).set(as('designer')).expect(200);
    return calc;
  }

  /** The calc package's text. */
  async function packageText(id: string, role: 'designer' | 'student') {
    const pdf = await http()
      .get(`/api/calculations/${id}/report.pdf`)
      .set(as(role))
      .buffer(true)
      .parse(binaryBody)
      .expect(200);
    return (await pdfText(pdf.body as Buffer)).text;
  }

  it('is stored as an input, made by analyse, and shown with the calc', async () => {
    const calc = await withHistory('History stored');
    expect(calc.history!.record.origin).toBe('demo');
    expect(calc.hasHistoryResults).toBe(false);
    await http()
      .get(`/api/calculations/${calc.id}/history-results`)
      .set(as('designer'))
      .expect(404);
    expect(calc.analysisStale).toBe(true);
    await http().post(`/api/calculations/${calc.id}/analyse`).set(as('designer')).expect(200);
    const stored = (
      await http().get(`/api/calculations/${calc.id}`).set(as('designer')).expect(200)
    ).body as CalculationDto;
    // The calc says it keeps results; they come on their own route (they are most of its size).
    expect(stored.hasHistoryResults).toBe(true);
    expect(stored).not.toHaveProperty('historyResults');
    const results = (
      await http()
        .get(`/api/calculations/${calc.id}/history-results`)
        .set(as('designer'))
        .expect(200)
    ).body as ResponseHistoryResult;
    const whole = (
      await http().get(`/api/calculations/${calc.id}?detail=full`).set(as('designer')).expect(200)
    ).body as WholeCalculationDto;
    expect(whole.historyResults).toEqual(results);
    expect(results.scaling.explanation).toContain('mean over 0.1 s to 1.5 s');
    expect(results.response.peaks.displacement).toHaveLength(sampleInputs().storeys.length);
    expect(results.response.scale).toBe(results.scaling.factor);
    expect(results.recordSpectrum.periods).toContain(stored.analysis!.modes[0].period);
    expect(results.freeVibration!.startedFrom).toContain('mode 1 shape, 0.05 m');
    expect(results.freeVibration!.initialDisplacements.at(-1)).toBeCloseTo(0.05, 12);

    // The peaks as a CSV table, in US units (1 in = 0.0254 m), with their times.
    const csv = await http()
      .get(`/api/calculations/${calc.id}/results.csv?table=history&units=US`)
      .set(as('designer'))
      .expect(200);
    const lines = csv.text.trim().split(/\r?\n/);
    expect(lines[0]).toContain('Displacement (in),Displacement at (s)');
    expect(lines).toHaveLength(1 + sampleInputs().storeys.length);
    const roof = lines.at(-1)!.split(',');
    expect(Number(roof[2])).toBeCloseTo(results.response.peaks.displacement.at(-1)! / 0.0254, 3);
    expect(Number(roof[3])).toBeCloseTo(results.response.peakTimes.displacement.at(-1)!, 6);

    // The audit trail names what an edit of the setup changed.
    await http()
      .patch(`/api/calculations/${calc.id}`)
      .set(as('designer'))
      .send({
        version: stored.version,
        history: { ...stored.history, scaling: { method: 'factor', factor: 1.5 } },
      })
      .expect(200);
    const events = (
      await http().get(`/api/calculations/${calc.id}/history`).set(as('designer')).expect(200)
    ).body as AuditEventDto[];
    const edits = events.filter((e) => e.action === 'edited').map((e) => e.detail?.changes);
    expect(edits).toContainEqual(['response history']);
    expect(edits).toContainEqual(['record scaling']);
    // The calc package then says the stored response history is older than the record.
    const text = await packageText(calc.id, 'designer');
    expect(text).toContain('older than the inputs or the record');
    expect(text).not.toContain('Peak responses to the record');
  });

  it.each([
    [
      { scaling: { method: 'spectrum', rule: 'max', periodRange: [0.1, 1] } },
      'history.scaling: rule must be "mean" or "not-below-90"',
    ],
    [
      { scaling: { method: 'factor', factor: 0 } },
      'history.scaling: factor must be a number greater than 0 and at most 100',
    ],
    [
      {
        freeVibration: {
          start: { kind: 'shape', displacements: [0.1] },
          duration: 1,
          timeStep: 0.01,
        },
      },
      'history.freeVibration.start.displacements must have one value per level (3)',
    ],
    [
      {
        freeVibration: {
          start: { kind: 'mode', mode: 1, amplitude: 0 },
          duration: 1,
          timeStep: 0.01,
        },
      },
      'history.freeVibration.start: amplitude must be a number other than 0 (m)',
    ],
  ])('refuses a setup %j, naming the field, and keeps what was saved', async (change, message) => {
    const calc = await withHistory(`History refused ${message.slice(8, 30)}`);
    const res = await http()
      .patch(`/api/calculations/${calc.id}`)
      .set(as('designer'))
      .send({ version: calc.version, history: { ...calc.history, ...change } })
      .expect(400);
    expect((res.body.message as string[]).join(' | ')).toContain(message);
    const after = (await http().get(`/api/calculations/${calc.id}`).set(as('designer')).expect(200))
      .body as CalculationDto;
    expect(after.history).toEqual(calc.history);
  });

  it('is sealed by the lock, goes into the calc package, and carries over to the next revision', async () => {
    const calc = await submittedWithHistory('History sealed');
    await http()
      .post(`/api/calculations/${calc.id}/lock`)
      .set(as('reviewer'))
      .send({ statement: 'Checked independently.' })
      .expect(200);
    const seal = (
      await http().get(`/api/calculations/${calc.id}/seal`).set(as('student')).expect(200)
    ).body as SealCheckResponse;
    expect(seal.valid).toBe(true);
    // An edit of the stored response history in the database breaks the seal.
    await state.app
      .get(MikroORM)
      .em.getConnection()
      .execute(
        `update calculations set history_results = json_set(history_results, '$.response.peaks.shear[0]', 1) where id = ?`,
        [calc.id],
      );
    const broken = (
      await http().get(`/api/calculations/${calc.id}/seal`).set(as('student')).expect(200)
    ).body as SealCheckResponse;
    expect(broken).toMatchObject({ valid: false, hashValid: false });

    const text = await packageText(calc.id, 'student');
    expect(text).toContain('Response history');
    expect(text).toContain('Invented demo record');
    expect(text).toContain('Peak responses to the record');
    expect(text).toContain('Free vibration');

    const next = (
      await http().post(`/api/calculations/${calc.id}/revise`).set(as('designer')).expect(201)
    ).body as CalculationDto;
    expect(next.history).toEqual(calc.history);
    expect(next.hasHistoryResults).toBe(false);
  });

  it('shows the reviewer what changed in it since the submission returned', async () => {
    const draft = await submittedWithHistory('History changes for the reviewer');
    await http()
      .post(`/api/calculations/${draft.id}/return`)
      .set(as('reviewer'))
      .send({ comment: 'Scale over a wider range.' })
      .expect(200);
    const returned = (
      await http().get(`/api/calculations/${draft.id}`).set(as('designer')).expect(200)
    ).body as CalculationDto;
    await http()
      .patch(`/api/calculations/${draft.id}`)
      .set(as('designer'))
      .send({
        version: returned.version,
        history: {
          ...returned.history,
          scaling: { method: 'spectrum', rule: 'mean', periodRange: [0.1, 3] },
        },
      })
      .expect(200);
    const changes = (
      await http()
        .get(`/api/calculations/${draft.id}/changes?since=submission`)
        .set(as('reviewer'))
        .expect(200)
    ).body as CalculationChanges;
    expect(changes.unchanged).toBe(false);
    expect(changes.history).toEqual([
      {
        field: 'record scaling',
        old: 'design spectrum mean over 0.1 to 1.5 s',
        new: 'design spectrum mean over 0.1 to 3 s',
      },
    ]);
  });

  it('goes out with the whole calc (JSON) and comes back into the imported draft', async () => {
    const calc = await withHistory('History exported');
    const exported = await http()
      .get(`/api/calculations/${calc.id}/export.json`)
      .set(as('designer'))
      .expect(200);
    expect(exported.body.calculation.history).toEqual(calc.history);
    const imported = (
      await http()
        .post(`/api/projects/${calc.projectId}/calculations/import`)
        .set(as('designer'))
        .send(exported.body)
        .expect(201)
    ).body as CalculationDto;
    expect(imported.history).toEqual(calc.history);
  });

  it("a write to a locked calc's history is refused with 409", async () => {
    const locked = await calcInState(signedIn, 'locked', 'History locked');
    const res = await http()
      .patch(`/api/calculations/${locked.id}`)
      .set(as('designer'))
      .send({ version: locked.version, history: null })
      .expect(409);
    expect(res.body.message[0]).toContain('can never change');
  });
});
