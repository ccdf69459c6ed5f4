import { MikroORM } from '@mikro-orm/knex';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import type { App } from 'supertest/types';
import { Calculation } from '../src/calculations/calculation.entity';
import { sampleInputs as inputs, useSignedInApp } from './support/fixtures';
import { createTestApp, signIn, tokenFor, type DemoRole } from './support/test-app';

describe('Review, lock, seal and revise', () => {
  let app: INestApplication<App>;
  const tokens = {} as Record<DemoRole | 'lapsed' | 'unlicensed' | 'reviewerAuthor', string>;
  let projectId: string;
  const http = () => request(app.getHttpServer());
  const as = (who: keyof typeof tokens) => ({ Authorization: `Bearer ${tokens[who]}` });
  const post = (who: keyof typeof tokens, path: string, body: object = {}) =>
    http().post(path).set(as(who)).send(body);

  beforeAll(async () => {
    app = await createTestApp();
    for (const role of ['admin', 'designer', 'reviewer', 'student'] as const)
      tokens[role] = await tokenFor(app, role);
    await post('admin', '/api/users', {
      email: 'lapsed@tiermode.test',
      name: 'Lapsed Reviewer',
      role: 'reviewer',
      password: 'gusset-plate-2019',
      licenseNumber: 'SE-9',
      licenseJurisdiction: 'Invented State',
      licenseExpiresOn: '2021-06-30',
    }).expect(201);
    tokens.lapsed = await signIn(app, 'lapsed@tiermode.test', 'gusset-plate-2019');
    await post('admin', '/api/users', {
      email: 'unlicensed@tiermode.test',
      name: 'Unlicensed Reviewer',
      role: 'reviewer',
      password: 'anchor-bolt-2026',
    }).expect(201);
    tokens.unlicensed = await signIn(app, 'unlicensed@tiermode.test', 'anchor-bolt-2026');
    projectId = (await post('designer', '/api/projects', { name: 'Review project' }).expect(201))
      .body.id;
  });
  afterAll(() => app.close());

  async function submittedCalc(title = 'Seismic calc'): Promise<{ id: string; version: number }> {
    const calc = (
      await post('designer', `/api/projects/${projectId}/calculations`, {
        title,
        inputs: inputs(),
      }).expect(201)
    ).body;
    await post('designer', `/api/calculations/${calc.id}/analyse`).expect(200);
    return (await post('designer', `/api/calculations/${calc.id}/submit`).expect(200)).body;
  }

  it('runs the whole state machine: draft, submitted, returned, submitted, locked, revised, locked, superseded', async () => {
    const calc = (
      await post('designer', `/api/projects/${projectId}/calculations`, {
        title: 'Tower',
        inputs: inputs(),
      }).expect(201)
    ).body;
    // Not analysed yet: cannot be submitted.
    const early = await post('designer', `/api/calculations/${calc.id}/submit`).expect(409);
    expect(early.body.message[0]).toMatch(/Analyse the current inputs before submitting/);
    await post('designer', `/api/calculations/${calc.id}/analyse`).expect(200);
    expect(
      (await post('designer', `/api/calculations/${calc.id}/submit`).expect(200)).body.status,
    ).toBe('submitted');

    const returned = await post('reviewer', `/api/calculations/${calc.id}/return`, {
      comment: 'Check the storey 2 stiffness.',
    }).expect(200);
    expect(returned.body).toMatchObject({ status: 'draft', reviewer: { name: 'Tomas Hale' } });
    expect(returned.body.comments.map((c: { body: string }) => c.body)).toEqual([
      'Check the storey 2 stiffness.',
    ]);

    const fixed = inputs();
    fixed.storeys[1].stiffness = 3.8e8;
    await http()
      .patch(`/api/calculations/${calc.id}`)
      .set(as('designer'))
      .send({ version: returned.body.version, inputs: fixed })
      .expect(200);
    await post('designer', `/api/calculations/${calc.id}/analyse`).expect(200);
    await post('designer', `/api/calculations/${calc.id}/submit`).expect(200);

    const locked = await post('reviewer', `/api/calculations/${calc.id}/lock`, {
      statement: 'Accepted for the permit set.',
    }).expect(200);
    expect(locked.body.status).toBe('locked');
    expect(locked.body.seal).toMatchObject({
      reviewerName: 'Tomas Hale',
      statement: 'Accepted for the permit set.',
    });
    expect(locked.body.seal.hash).toMatch(/^[0-9a-f]{64}$/);
    const seal = await http()
      .get(`/api/calculations/${calc.id}/seal`)
      .set(as('student'))
      .expect(200);
    expect(seal.body).toMatchObject({
      valid: true,
      hash: locked.body.seal.hash,
      recomputed: locked.body.seal.hash,
    });

    const revision2 = await post('designer', `/api/calculations/${calc.id}/revise`).expect(201);
    expect(revision2.body).toMatchObject({
      status: 'draft',
      revision: 2,
      previousRevisionId: calc.id,
    });
    expect(revision2.body.inputs).toEqual(fixed);
    await post('designer', `/api/calculations/${calc.id}/revise`).expect(409);
    await post('designer', `/api/calculations/${revision2.body.id}/analyse`).expect(200);
    await post('designer', `/api/calculations/${revision2.body.id}/submit`).expect(200);
    await post('reviewer', `/api/calculations/${revision2.body.id}/lock`, {
      statement: 'Revision 2 accepted.',
    }).expect(200);
    const first = await http().get(`/api/calculations/${calc.id}`).set(as('designer')).expect(200);
    expect(first.body.status).toBe('superseded');
    expect(
      (await http().get(`/api/calculations/${calc.id}/seal`).set(as('designer'))).body.valid,
    ).toBe(true);
  });

  it('lets only a licensed reviewer who is not the author lock', async () => {
    const calc = await submittedCalc();
    await post('lapsed', `/api/calculations/${calc.id}/lock`, { statement: 'ok' }).expect(403);
    await post('unlicensed', `/api/calculations/${calc.id}/lock`, { statement: 'ok' }).expect(403);
    await post('designer', `/api/calculations/${calc.id}/lock`, { statement: 'ok' }).expect(403);
    await post('admin', `/api/calculations/${calc.id}/lock`, { statement: 'ok' }).expect(403);
    await post('student', `/api/calculations/${calc.id}/lock`, { statement: 'ok' }).expect(403);
    const noStatement = await post('reviewer', `/api/calculations/${calc.id}/lock`, {
      statement: '  ',
    }).expect(400);
    expect(noStatement.body.message).toEqual(['statement must state what you accept']);
    // A licensed reviewer who is also the author (made so by its own project) cannot lock.
    // Reviewers cannot author calcs at all here, so the rule is checked in the ability tests.
  });

  it('refuses every write to a locked calculation with 409 naming the seal', async () => {
    const calc = await submittedCalc('To be locked');
    const locked = (
      await post('reviewer', `/api/calculations/${calc.id}/lock`, {
        statement: 'Accepted.',
      }).expect(200)
    ).body;
    const prefix = locked.seal.hash.slice(0, 12);
    const patch = await http()
      .patch(`/api/calculations/${calc.id}`)
      .set(as('designer'))
      .send({ version: locked.version, title: 'Changed' })
      .expect(409);
    expect(patch.body.message[0]).toContain(prefix);
    await post('designer', `/api/calculations/${calc.id}/analyse`).expect(409);
    await post('designer', `/api/calculations/${calc.id}/submit`).expect(409);
    await post('reviewer', `/api/calculations/${calc.id}/return`, { comment: 'Too late' }).expect(
      409,
    );
    await post('reviewer', `/api/calculations/${calc.id}/lock`, { statement: 'Again' }).expect(409);
  });

  it('refuses a change to a locked calc at the entity layer too, whatever code asks', async () => {
    const calc = await submittedCalc('Entity guard');
    await post('reviewer', `/api/calculations/${calc.id}/lock`, { statement: 'Accepted.' }).expect(
      200,
    );
    const em = app.get(MikroORM).em.fork();
    const entity = await em.findOneOrFail(Calculation, { id: calc.id });
    entity.title = 'Sneaky';
    await expect(em.flush()).rejects.toThrow('A locked calculation cannot change (title)');
  });

  it('shows valid: false once a stored row is changed behind the application', async () => {
    const calc = await submittedCalc('Tamper check');
    await post('reviewer', `/api/calculations/${calc.id}/lock`, { statement: 'Accepted.' }).expect(
      200,
    );
    const connection = app.get(MikroORM).em.getConnection();
    await connection.execute(
      `update calculations set inputs = json_set(inputs, '$.dampingRatio', 0.02) where id = ?`,
      [calc.id],
    );
    const seal = await http()
      .get(`/api/calculations/${calc.id}/seal`)
      .set(as('reviewer'))
      .expect(200);
    expect(seal.body.valid).toBe(false);
    expect(seal.body.recomputed).not.toBe(seal.body.hash);
  });

  it('lets a reviewer return only with a comment, and only a submitted calc', async () => {
    const calc = await submittedCalc('Return check');
    const empty = await post('reviewer', `/api/calculations/${calc.id}/return`, {
      comment: '',
    }).expect(400);
    expect(empty.body.message).toEqual(['comment must say what the designer should change']);
    await post('designer', `/api/calculations/${calc.id}/return`, { comment: 'self' }).expect(403);
    await post('reviewer', `/api/calculations/${calc.id}/return`, { comment: 'Fix it' }).expect(
      200,
    );
    await post('reviewer', `/api/calculations/${calc.id}/return`, { comment: 'Again' }).expect(409);
    await http().get(`/api/calculations/${calc.id}/seal`).set(as('designer')).expect(404);
  });
});

describe('GET /api/library', () => {
  const { http, as } = useSignedInApp();

  it('lists locked calcs for a student, and never a draft or a submitted one', async () => {
    const projectId = (
      await http().post('/api/projects').set(as('designer')).send({ name: 'Library project' })
    ).body.id;
    const make = async (title: string) => {
      const calc = (
        await http()
          .post(`/api/projects/${projectId}/calculations`)
          .set(as('designer'))
          .send({ title, inputs: inputs() })
      ).body;
      await http().post(`/api/calculations/${calc.id}/analyse`).set(as('designer')).expect(200);
      return calc.id as string;
    };
    const draftId = await make('Still a draft');
    const submittedId = await make('Under review');
    await http().post(`/api/calculations/${submittedId}/submit`).set(as('designer')).expect(200);
    const lockedId = await make('Calc of record');
    await http().post(`/api/calculations/${lockedId}/submit`).set(as('designer')).expect(200);
    await http()
      .post(`/api/calculations/${lockedId}/lock`)
      .set(as('reviewer'))
      .send({ statement: 'Accepted.' })
      .expect(200);

    const library = await http().get('/api/library').set(as('student')).expect(200);
    const here = library.body.filter((e: { projectId: string }) => e.projectId === projectId);
    expect(here.map((e: { title: string }) => e.title)).toEqual(['Calc of record']);
    expect(
      library.body.every((e: { status: string }) => ['locked', 'superseded'].includes(e.status)),
    ).toBe(true);
    expect(here[0]).toMatchObject({
      status: 'locked',
      storeyCount: 3,
      buildingHeight: 11,
      reviewerName: 'Tomas Hale',
    });
    await http().get(`/api/calculations/${lockedId}`).set(as('student')).expect(200);
    await http().get(`/api/calculations/${draftId}`).set(as('student')).expect(403);
    await http().get(`/api/calculations/${submittedId}`).set(as('student')).expect(403);
  });
});

describe('The audit trail', () => {
  const { state, http, as } = useSignedInApp();

  it('records each step as a chained event, verifies, and finds a tampered event', async () => {
    const projectId = (
      await http().post('/api/projects').set(as('designer')).send({ name: 'Audit project' })
    ).body.id;
    const calc = (
      await http()
        .post(`/api/projects/${projectId}/calculations`)
        .set(as('designer'))
        .send({ title: 'Audited', inputs: inputs() })
    ).body;
    await http().post(`/api/calculations/${calc.id}/analyse`).set(as('designer')).expect(200);
    await http().post(`/api/calculations/${calc.id}/submit`).set(as('designer')).expect(200);
    await http()
      .post(`/api/calculations/${calc.id}/lock`)
      .set(as('reviewer'))
      .send({ statement: 'Accepted.' })
      .expect(200);

    const history = await http()
      .get(`/api/calculations/${calc.id}/history`)
      .set(as('designer'))
      .expect(200);
    expect(history.body.map((e: { action: string }) => e.action)).toEqual([
      'created',
      'analysed',
      'submitted',
      'locked',
    ]);
    expect(history.body.map((e: { actorName: string }) => e.actorName)).toEqual([
      'Mira Castell',
      'Mira Castell',
      'Mira Castell',
      'Tomas Hale',
    ]);
    history.body
      .slice(1)
      .forEach((e: { previousHash: string }, i: number) =>
        expect(e.previousHash).toBe(history.body[i].hash),
      );

    await http().get('/api/audit/verify').set(as('designer')).expect(403);
    await http().get('/api/audit/verify').set(as('student')).expect(403);
    expect((await http().get('/api/audit/verify').set(as('admin')).expect(200)).body).toMatchObject(
      { valid: true, brokenAt: null },
    );

    const analysed = history.body[1];
    await state.app
      .get(MikroORM)
      .em.getConnection()
      .execute(`update audit_events set actor_name = 'Someone else' where seq = ?`, [analysed.seq]);
    const broken = await http().get('/api/audit/verify').set(as('reviewer')).expect(200);
    expect(broken.body).toMatchObject({ valid: false, brokenAt: analysed.seq });
  });
});

describe('Review comments tied to storeys or results', () => {
  const { http, as } = useSignedInApp();

  it('lets the reviewer comment on a storey, the designer answer and resolve, and nothing once locked', async () => {
    const projectId = (
      await http().post('/api/projects').set(as('designer')).send({ name: 'Comment project' })
    ).body.id;
    const calc = (
      await http()
        .post(`/api/projects/${projectId}/calculations`)
        .set(as('designer'))
        .send({ title: 'Commented', inputs: inputs() })
    ).body;
    await http().post(`/api/calculations/${calc.id}/analyse`).set(as('designer')).expect(200);
    await http().post(`/api/calculations/${calc.id}/submit`).set(as('designer')).expect(200);

    const commented = await http()
      .post(`/api/calculations/${calc.id}/comments`)
      .set(as('reviewer'))
      .send({ body: 'Is this stiffness cracked or gross?', target: 'storey 2' })
      .expect(201);
    const comment = commented.body.comments[0];
    expect(comment).toMatchObject({
      target: 'storey 2',
      resolved: false,
      author: { name: 'Tomas Hale' },
    });
    await http()
      .post(`/api/calculations/${calc.id}/comments`)
      .set(as('designer'))
      .send({ body: 'Cracked, 0.5 EI.' })
      .expect(201);
    await http()
      .post(`/api/calculations/${calc.id}/comments`)
      .set(as('student'))
      .send({ body: 'Hi' })
      .expect(403);
    await http()
      .post(`/api/calculations/${calc.id}/comments`)
      .set(as('reviewer'))
      .send({ body: ' ' })
      .expect(400);

    const resolved = await http()
      .patch(`/api/comments/${comment.id}`)
      .set(as('designer'))
      .send({ resolved: true })
      .expect(200);
    expect(resolved.body.comments.find((c: { id: string }) => c.id === comment.id).resolved).toBe(
      true,
    );
    await http()
      .patch(`/api/comments/${comment.id}`)
      .set(as('student'))
      .send({ resolved: false })
      .expect(403);
    await http()
      .patch(`/api/comments/${comment.id}`)
      .set(as('designer'))
      .send({ resolved: 'yes' })
      .expect(400);

    await http()
      .post(`/api/calculations/${calc.id}/lock`)
      .set(as('reviewer'))
      .send({ statement: 'Accepted.' })
      .expect(200);
    await http()
      .post(`/api/calculations/${calc.id}/comments`)
      .set(as('reviewer'))
      .send({ body: 'Late' })
      .expect(409);
    await http()
      .patch(`/api/comments/${comment.id}`)
      .set(as('designer'))
      .send({ resolved: false })
      .expect(409);
    const history = await http().get(`/api/calculations/${calc.id}/history`).set(as('designer'));
    expect(history.body.map((e: { action: string }) => e.action)).toContain('comment resolved');
  });
});
