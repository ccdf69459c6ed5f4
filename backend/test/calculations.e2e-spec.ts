import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { ENGINE_VERSION } from '../src/analysis/engine/analyse';
import type { App } from 'supertest/types';
import { sampleInputs as inputs } from './support/fixtures';
import { createTestApp, tokenFor, type DemoRole } from './support/test-app';

describe('Saved calculations (drafts)', () => {
  let app: INestApplication<App>;
  const tokens = {} as Record<DemoRole, string>;
  let projectId: string;
  const http = () => request(app.getHttpServer());
  const as = (role: DemoRole) => ({ Authorization: `Bearer ${tokens[role]}` });

  beforeAll(async () => {
    app = await createTestApp();
    for (const role of ['admin', 'designer', 'reviewer', 'student'] as const)
      tokens[role] = await tokenFor(app, role);
    projectId = (
      await http()
        .post('/api/projects')
        .set(as('designer'))
        .send({ name: 'Calc project' })
        .expect(201)
    ).body.id;
  });
  afterAll(() => app.close());

  const createCalc = (body: object = { title: 'Lateral analysis', inputs: inputs() }) =>
    http().post(`/api/projects/${projectId}/calculations`).set(as('designer')).send(body);

  it('creates a draft, revision 1, with its inputs, not yet analysed', async () => {
    const res = await createCalc().expect(201);
    expect(res.body).toMatchObject({
      status: 'draft',
      revision: 1,
      version: 1,
      analysis: null,
      analysisStale: true,
    });
    expect(res.body.inputs).toEqual(inputs());
    expect(res.body.author.name).toBe('Mira Castell');
  });

  it('keeps the display units, which change no result', async () => {
    const calc = (await createCalc().expect(201)).body;
    expect(calc.displayUnits).toBe('SI');
    await http().post(`/api/calculations/${calc.id}/analyse`).set(as('designer')).expect(200);
    const fresh = await http().get(`/api/calculations/${calc.id}`).set(as('designer'));
    const res = await http()
      .patch(`/api/calculations/${calc.id}`)
      .set(as('designer'))
      .send({ version: fresh.body.version, displayUnits: 'US' })
      .expect(200);
    expect(res.body).toMatchObject({ displayUnits: 'US', analysisStale: false });
    const bad = await http()
      .patch(`/api/calculations/${calc.id}`)
      .set(as('designer'))
      .send({ version: res.body.version, displayUnits: 'imperial' })
      .expect(400);
    expect(bad.body.message).toEqual(['displayUnits must be "SI" or "US"']);
  });

  it('keeps the storey labels with the inputs', async () => {
    const labelled = inputs();
    labelled.storeys[0].label = 'Ground';
    labelled.storeys[2].label = 'Roof';
    const res = await http()
      .post(`/api/projects/${projectId}/calculations`)
      .set(as('designer'))
      .send({ title: 'Labelled', inputs: labelled })
      .expect(201);
    const stored = await http().get(`/api/calculations/${res.body.id}`).set(as('designer'));
    expect(stored.body.inputs.storeys.map((s: { label?: string }) => s.label)).toEqual([
      'Ground',
      undefined,
      'Roof',
    ]);
  });

  it('analyses the stored inputs, keeps the result with the engine version, and flags it stale after an edit', async () => {
    const calc = (await createCalc().expect(201)).body;
    const analysed = await http()
      .post(`/api/calculations/${calc.id}/analyse`)
      .set(as('designer'))
      .expect(200);
    expect(analysed.body.modes).toHaveLength(3);
    const stored = await http().get(`/api/calculations/${calc.id}`).set(as('reviewer')).expect(200);
    expect(stored.body.analysis.combined.cqc.baseShear).toBe(analysed.body.combined.cqc.baseShear);
    expect(stored.body).toMatchObject({ engineVersion: ENGINE_VERSION, analysisStale: false });
    const edited = await http()
      .patch(`/api/calculations/${calc.id}`)
      .set(as('designer'))
      .send({ version: stored.body.version, inputs: { ...inputs(), dampingRatio: 0.03 } })
      .expect(200);
    expect(edited.body.analysisStale).toBe(true);
    expect(edited.body.inputs.dampingRatio).toBe(0.03);
  });

  it('refuses a stale version with 409 and keeps the other writer’s change', async () => {
    const calc = (await createCalc().expect(201)).body;
    await http()
      .patch(`/api/calculations/${calc.id}`)
      .set(as('designer'))
      .send({ version: 1, title: 'First' })
      .expect(200);
    const stale = await http()
      .patch(`/api/calculations/${calc.id}`)
      .set(as('designer'))
      .send({ version: 1, title: 'Second' })
      .expect(409);
    expect(stale.body.message[0]).toMatch(/changed by someone else/);
    expect((await http().get(`/api/calculations/${calc.id}`).set(as('designer'))).body.title).toBe(
      'First',
    );
  });

  it('names the field and storey of bad inputs and saves nothing', async () => {
    const bad = inputs();
    bad.storeys[1].mass = -5;
    const res = await createCalc({ title: 'Bad', inputs: bad }).expect(400);
    expect(res.body.message).toContain(
      'inputs.storeys[1].mass (storey 2) must be a positive number (kg)',
    );
    const unsorted = {
      ...inputs(),
      spectrum: {
        points: [
          { period: 1, sa: 1 },
          { period: 0.5, sa: 1 },
        ],
      },
    };
    const res2 = await createCalc({ title: 'Bad', inputs: unsorted }).expect(400);
    expect(res2.body.message).toEqual([
      'inputs.spectrum.points[1].period (point 2) must be greater than the period of point 1',
    ]);
    const list = await http()
      .get(`/api/projects/${projectId}/calculations`)
      .set(as('designer'))
      .expect(200);
    expect(list.body.some((c: { title: string }) => c.title === 'Bad')).toBe(false);
    const calc = (await createCalc().expect(201)).body;
    await http()
      .patch(`/api/calculations/${calc.id}`)
      .set(as('designer'))
      .send({ title: 'Kept' })
      .expect(400);
    expect((await http().get(`/api/calculations/${calc.id}`).set(as('designer'))).body.title).toBe(
      'Lateral analysis',
    );
  });

  it('lets only designers who are members create, edit and analyse; others read', async () => {
    const calc = (await createCalc().expect(201)).body;
    for (const role of ['reviewer', 'admin', 'student'] as const) {
      await http()
        .post(`/api/projects/${projectId}/calculations`)
        .set(as(role))
        .send({ title: 'x', inputs: inputs() })
        .expect(403);
      await http()
        .patch(`/api/calculations/${calc.id}`)
        .set(as(role))
        .send({ version: calc.version, title: 'x' })
        .expect(403);
      await http().post(`/api/calculations/${calc.id}/analyse`).set(as(role)).expect(403);
    }
    await http().get(`/api/calculations/${calc.id}`).set(as('reviewer')).expect(200);
    await http().get(`/api/calculations/${calc.id}`).set(as('admin')).expect(200);
  });

  it('keeps drafts from students, by list and by id', async () => {
    const calc = (await createCalc().expect(201)).body;
    await http().get(`/api/calculations/${calc.id}`).set(as('student')).expect(403);
    await http().get(`/api/projects/${projectId}/calculations`).set(as('student')).expect(403);
  });

  it('answers an unknown project or calculation with 404', async () => {
    const unknown = '6f1c1f3e-8f43-4a55-9d4e-1b2c3d4e5f60';
    await http().get(`/api/calculations/${unknown}`).set(as('designer')).expect(404);
    await http()
      .post(`/api/projects/${unknown}/calculations`)
      .set(as('designer'))
      .send({ title: 'x', inputs: inputs() })
      .expect(404);
  });
});
