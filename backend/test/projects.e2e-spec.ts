import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import type { App } from 'supertest/types';
import { createTestApp, signIn, tokenFor, type DemoRole } from './support/test-app';

describe('Projects (/api/projects)', () => {
  let app: INestApplication<App>;
  const tokens = {} as Record<DemoRole | 'other', string>;
  let otherDesignerId: string;
  const http = () => request(app.getHttpServer());
  const as = (who: keyof typeof tokens) => ({ Authorization: `Bearer ${tokens[who]}` });

  beforeAll(async () => {
    app = await createTestApp();
    for (const role of ['admin', 'designer', 'reviewer', 'student'] as const) {
      tokens[role] = await tokenFor(app, role);
    }
    const other = await http()
      .post('/api/users')
      .set(as('admin'))
      .send({
        email: 'second.designer@tiermode.test',
        name: 'Second Designer',
        role: 'designer',
        password: 'corbel-shear-2044',
      })
      .expect(201);
    otherDesignerId = other.body.id;
    tokens.other = await signIn(app, 'second.designer@tiermode.test', 'corbel-shear-2044');
  });
  afterAll(() => app.close());

  const create = (who: keyof typeof tokens, body: object) =>
    http().post('/api/projects').set(as(who)).send(body);

  it('lets a designer create a project, becoming its member', async () => {
    const res = await create('designer', {
      name: '  Harbour Street housing  ',
      site: 'An invented site',
    }).expect(201);
    expect(res.body).toMatchObject({
      name: 'Harbour Street housing',
      site: 'An invented site',
      version: 1,
    });
    expect(res.body.members.map((m: { name: string }) => m.name)).toEqual(['Mira Castell']);
    const read = await http().get(`/api/projects/${res.body.id}`).set(as('designer')).expect(200);
    expect(read.body.id).toBe(res.body.id);
  });

  it.each(['reviewer', 'student', 'admin'] as const)(
    'refuses a %s creating a project',
    async (role) => {
      await create(role, { name: 'Not mine' }).expect(403);
    },
  );

  it('lets designers, reviewers and admins list projects, and refuses students', async () => {
    for (const role of ['designer', 'reviewer', 'admin', 'other'] as const) {
      const res = await http().get('/api/projects').set(as(role)).expect(200);
      expect(res.body.length).toBeGreaterThan(0);
    }
    await http().get('/api/projects').set(as('student')).expect(403);
  });

  it("keeps another designer's project read-only until it is made a member", async () => {
    const project = (await create('designer', { name: 'Laboratory tower' }).expect(201)).body;
    await http().get(`/api/projects/${project.id}`).set(as('other')).expect(200);
    await http()
      .patch(`/api/projects/${project.id}`)
      .set(as('other'))
      .send({ name: 'Taken over' })
      .expect(403);
    await http().delete(`/api/projects/${project.id}`).set(as('other')).expect(403);
    await http()
      .patch(`/api/projects/${project.id}`)
      .set(as('reviewer'))
      .send({ name: 'Nope' })
      .expect(403);
    const me = await http().get('/api/auth/me').set(as('designer'));
    const shared = await http()
      .patch(`/api/projects/${project.id}`)
      .set(as('designer'))
      .send({ memberIds: [me.body.user.id, otherDesignerId] })
      .expect(200);
    expect(shared.body.memberIds).toHaveLength(2);
    await http()
      .patch(`/api/projects/${project.id}`)
      .set(as('other'))
      .send({ name: 'Laboratory tower, phase 2' })
      .expect(200);
  });

  it('refuses members who are not designers, and removing oneself', async () => {
    const project = (await create('designer', { name: 'Members check' }).expect(201)).body;
    const me = await http().get('/api/auth/me').set(as('designer'));
    const reviewer = await http().get('/api/auth/me').set(as('reviewer'));
    const notDesigner = await http()
      .patch(`/api/projects/${project.id}`)
      .set(as('designer'))
      .send({ memberIds: [me.body.user.id, reviewer.body.user.id] })
      .expect(400);
    expect(notDesigner.body.message).toEqual(['memberIds: Tomas Hale is not an active designer']);
    const self = await http()
      .patch(`/api/projects/${project.id}`)
      .set(as('designer'))
      .send({ memberIds: [otherDesignerId] })
      .expect(400);
    expect(self.body.message).toEqual(['memberIds must include you: you cannot remove yourself']);
  });

  it('refuses a stale version with 409 and keeps the other edit', async () => {
    const project = (await create('designer', { name: 'Version check' }).expect(201)).body;
    await http()
      .patch(`/api/projects/${project.id}`)
      .set(as('designer'))
      .send({ version: 1, name: 'First edit' })
      .expect(200);
    const stale = await http()
      .patch(`/api/projects/${project.id}`)
      .set(as('designer'))
      .send({ version: 1, name: 'Second edit' })
      .expect(409);
    expect(stale.body.message[0]).toMatch(/changed by someone else/);
    const now = await http().get(`/api/projects/${project.id}`).set(as('designer'));
    expect(now.body.name).toBe('First edit');
  });

  it.each([
    [{}, 'name must be a string'],
    [{ name: '   ' }, 'name must not be empty'],
    [{ name: 'x'.repeat(201) }, 'name must be at most 200 characters'],
    [{ name: 'Ok', owner: 'me' }, 'property owner should not exist'],
  ])('refuses the create body %j with 400 naming the field', async (body, message) => {
    const res = await create('designer', body).expect(400);
    expect(res.body.message).toContain(message);
  });

  it('answers an unknown id with 404 and a malformed one with 400, and deletes for members', async () => {
    await http()
      .get('/api/projects/6f1c1f3e-8f43-4a55-9d4e-1b2c3d4e5f60')
      .set(as('designer'))
      .expect(404);
    await http().get('/api/projects/not-an-id').set(as('designer')).expect(400);
    const project = (await create('designer', { name: 'To delete' }).expect(201)).body;
    await http().delete(`/api/projects/${project.id}`).set(as('designer')).expect(204);
    await http().get(`/api/projects/${project.id}`).set(as('designer')).expect(404);
  });
});
