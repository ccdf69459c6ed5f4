import { MikroORM } from '@mikro-orm/sqlite';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import type { App } from 'supertest/types';
import { waitForMail } from './support/fixtures';
import { createTestApp, signIn, tokenFor } from './support/test-app';

describe('The account-created mail and its set-password link', () => {
  let app: INestApplication<App>;
  let admin: string;
  const http = () => request(app.getHttpServer());

  beforeAll(async () => {
    app = await createTestApp();
    admin = await tokenFor(app, 'admin');
  });
  afterAll(() => app.close());

  async function linkFor(email: string): Promise<string> {
    const mail = await waitForMail(app, admin, (m) => m.to === email);
    expect(mail.subject).toBe('Your Tiermode account');
    const match = /\/set-password\?token=([A-Za-z0-9_-]+)/.exec(mail.text);
    if (!match) throw new Error('No link in the mail');
    return match[1];
  }

  const create = (email: string) =>
    http()
      .post('/api/users')
      .set('Authorization', `Bearer ${admin}`)
      .send({ email, name: 'New Person', role: 'designer', password: 'first-password-2026' })
      .expect(201);

  it('mails the new person a link that sets the password once', async () => {
    await create('new.person@tiermode.test');
    const token = await linkFor('new.person@tiermode.test');
    const weak = await http()
      .post('/api/auth/set-password')
      .send({ token, password: 'password123' })
      .expect(400);
    expect(weak.body.message).toEqual([
      'password is one of the most common passwords; choose another',
    ]);
    await http()
      .post('/api/auth/set-password')
      .send({ token, password: 'my-own-truss-4411' })
      .expect(204);
    await signIn(app, 'new.person@tiermode.test', 'my-own-truss-4411');
    const again = await http()
      .post('/api/auth/set-password')
      .send({ token, password: 'another-truss-4412' })
      .expect(400);
    expect(again.body.message[0]).toMatch(/not valid, was used already, or has expired/);
  });

  it('refuses an expired link and a made-up one', async () => {
    await create('late.person@tiermode.test');
    const token = await linkFor('late.person@tiermode.test');
    await app
      .get(MikroORM)
      .em.getConnection()
      .execute(`update users set set_password_expires_at = ? where email = ?`, [
        Date.now() - 1000,
        'late.person@tiermode.test',
      ]);
    await http()
      .post('/api/auth/set-password')
      .send({ token, password: 'my-own-truss-4411' })
      .expect(400);
    await http()
      .post('/api/auth/set-password')
      .send({ token: 'made-up', password: 'my-own-truss-4411' })
      .expect(400);
    await http().post('/api/auth/set-password').send({ password: 'my-own-truss-4411' }).expect(400);
  });
});
