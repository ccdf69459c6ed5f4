import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import type { App } from 'supertest/types';
import { allKeys, createTestApp, signIn, tokenFor } from './support/test-app';

const NEW_PASSWORD = 'tidal-column-88-brace';

describe('People and licences (/api/users)', () => {
  let app: INestApplication<App>;
  let admin: string;
  const http = () => request(app.getHttpServer());
  const asAdmin = <T extends request.Test>(req: T) => req.set('Authorization', `Bearer ${admin}`);

  beforeAll(async () => {
    app = await createTestApp();
    admin = await tokenFor(app, 'admin');
  });
  afterAll(() => app.close());

  it('lets the admin list people, with no password or hash in the body', async () => {
    const res = await asAdmin(http().get('/api/users')).expect(200);
    expect(res.body.map((u: { email: string }) => u.email).sort()).toEqual([
      'admin@tiermode.test',
      'designer@tiermode.test',
      'reviewer@tiermode.test',
      'student@tiermode.test',
    ]);
    expect(allKeys(res.body).some((k) => /password/i.test(k))).toBe(false);
    expect(JSON.stringify(res.body)).not.toMatch(/\$2[aby]\$/);
    const reviewer = res.body.find((u: { role: string }) => u.role === 'reviewer');
    expect(reviewer.licensed).toBe(true);
  });

  it.each(['designer', 'reviewer', 'student'] as const)(
    'refuses a %s every users route with 403',
    async (role) => {
      const token = await tokenFor(app, role);
      const auth = { Authorization: `Bearer ${token}` };
      await http().get('/api/users').set(auth).expect(403);
      await http()
        .post('/api/users')
        .set(auth)
        .send({ email: 'x@tiermode.test', name: 'X', role: 'admin', password: NEW_PASSWORD })
        .expect(403);
      const me = await http().get('/api/auth/me').set(auth).expect(200);
      await http()
        .patch(`/api/users/${me.body.user.id}`)
        .set(auth)
        .send({ role: 'admin' })
        .expect(403);
    },
  );

  it('creates a licensed reviewer who can then sign in', async () => {
    const res = await asAdmin(http().post('/api/users'))
      .send({
        email: ' New.Reviewer@Example.test ',
        name: 'Ines Varga',
        role: 'reviewer',
        password: NEW_PASSWORD,
        licenseNumber: 'SE-77001',
        licenseJurisdiction: 'Invented State',
        licenseExpiresOn: '2099-12-31',
      })
      .expect(201);
    expect(res.body).toMatchObject({
      email: 'new.reviewer@example.test',
      licensed: true,
      active: true,
    });
    expect(allKeys(res.body).some((k) => /password/i.test(k))).toBe(false);
    await signIn(app, 'new.reviewer@example.test', NEW_PASSWORD);
  });

  it('says a reviewer with an expired licence is not licensed', async () => {
    const res = await asAdmin(http().post('/api/users'))
      .send({
        email: 'lapsed@example.test',
        name: 'Lapsed Reviewer',
        role: 'reviewer',
        password: NEW_PASSWORD,
        licenseNumber: 'SE-1',
        licenseJurisdiction: 'Invented State',
        licenseExpiresOn: '2020-01-31',
      })
      .expect(201);
    expect(res.body.licensed).toBe(false);
  });

  it.each([
    [{ password: 'short' }, 'password must be at least 10 characters long'],
    [{ password: 'password123' }, 'password is one of the most common passwords; choose another'],
    [{ email: 'nope' }, 'email must be an email address'],
    [{ role: 'superuser' }, 'role must be one of: admin, designer, reviewer, student'],
    [{ name: '   ' }, 'name must not be empty'],
    [{ licenseExpiresOn: '31/12/2030' }, 'licenseExpiresOn must be a date written YYYY-MM-DD'],
    [{ licenseExpiresOn: '2030-02-30' }, 'licenseExpiresOn must be a date written YYYY-MM-DD'],
    [{ isAdmin: true }, 'property isAdmin should not exist'],
  ])('refuses a create body with %j, naming the field', async (change, message) => {
    const body = {
      email: 'valid@example.test',
      name: 'Valid',
      role: 'designer',
      password: NEW_PASSWORD,
      ...change,
    };
    const res = await asAdmin(http().post('/api/users')).send(body).expect(400);
    expect(res.body.message).toContain(message);
    const list = await asAdmin(http().get('/api/users'));
    expect(list.body.some((u: { email: string }) => u.email === 'valid@example.test')).toBe(false);
  });

  it('refuses a second account with the same email with 409', async () => {
    const res = await asAdmin(http().post('/api/users'))
      .send({
        email: 'DESIGNER@tiermode.test',
        name: 'Dup',
        role: 'designer',
        password: NEW_PASSWORD,
      })
      .expect(409);
    expect(res.body.message).toEqual(['email is already used by another account']);
  });

  it('deactivates a user: the existing token stops working at once and sign-in fails', async () => {
    const created = await asAdmin(http().post('/api/users'))
      .send({
        email: 'leaver@example.test',
        name: 'Leaver',
        role: 'designer',
        password: NEW_PASSWORD,
      })
      .expect(201);
    const token = await signIn(app, 'leaver@example.test', NEW_PASSWORD);
    await http().get('/api/auth/me').set('Authorization', `Bearer ${token}`).expect(200);
    const res = await asAdmin(http().patch(`/api/users/${created.body.id}`))
      .send({ active: false })
      .expect(200);
    expect(res.body.active).toBe(false);
    await http().get('/api/auth/me').set('Authorization', `Bearer ${token}`).expect(401);
    await http()
      .post('/api/auth/login')
      .send({ email: 'leaver@example.test', password: NEW_PASSWORD })
      .expect(401);
  });

  it('refuses a stale version with 409 and keeps the newer edit', async () => {
    const list = await asAdmin(http().get('/api/users'));
    const student = list.body.find((u: { email: string }) => u.email === 'student@tiermode.test');
    await asAdmin(http().patch(`/api/users/${student.id}`))
      .send({ version: student.version, name: 'Jun Okafor-Reyes' })
      .expect(200);
    const stale = await asAdmin(http().patch(`/api/users/${student.id}`))
      .send({ version: student.version, name: 'Overwritten' })
      .expect(409);
    expect(stale.body.message[0]).toMatch(/changed by someone else/);
    const after = await asAdmin(http().get('/api/users'));
    expect(after.body.find((u: { id: string }) => u.id === student.id).name).toBe(
      'Jun Okafor-Reyes',
    );
  });

  it('does not let an admin deactivate or demote itself', async () => {
    const me = await asAdmin(http().get('/api/auth/me'));
    const deactivate = await asAdmin(http().patch(`/api/users/${me.body.user.id}`))
      .send({ active: false })
      .expect(403);
    expect(deactivate.body.message).toEqual([
      'You cannot deactivate your own account or change your own role',
    ]);
    await asAdmin(http().patch(`/api/users/${me.body.user.id}`))
      .send({ role: 'student' })
      .expect(403);
    await asAdmin(http().patch(`/api/users/${me.body.user.id}`))
      .send({ name: 'Rowan Pike' })
      .expect(200);
  });

  it('answers a malformed id with 400 and an unknown one with 404', async () => {
    const bad = await asAdmin(http().patch('/api/users/not-a-uuid'))
      .send({ name: 'X' })
      .expect(400);
    expect(bad.body.message).toEqual(['id must be a UUID']);
    await asAdmin(http().patch('/api/users/6f1c1f3e-8f43-4a55-9d4e-1b2c3d4e5f60'))
      .send({ name: 'X' })
      .expect(404);
  });

  it('ends the sessions of a user whose password an admin resets', async () => {
    const token = await tokenFor(app, 'designer');
    const list = await asAdmin(http().get('/api/users'));
    const designer = list.body.find((u: { email: string }) => u.email === 'designer@tiermode.test');
    await asAdmin(http().patch(`/api/users/${designer.id}`))
      .send({ password: NEW_PASSWORD })
      .expect(200);
    await http().get('/api/auth/me').set('Authorization', `Bearer ${token}`).expect(401);
    await signIn(app, 'designer@tiermode.test', NEW_PASSWORD);
  });
});
