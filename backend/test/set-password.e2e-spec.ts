import { MikroORM } from '@mikro-orm/knex';
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

  const setPassword = (token: string, password: string) =>
    http().post('/api/auth/set-password').send({ token, password });
  const userId = async (email: string) =>
    (
      (await http().get('/api/users').set('Authorization', `Bearer ${admin}`).expect(200)).body as {
        id: string;
        email: string;
        version: number;
      }[]
    ).find((u) => u.email === email)!;

  it('kills a link once the password changes by any other route', async () => {
    // The person changes it themselves, signed in with the first password.
    await create('changes.own@tiermode.test');
    const own = await linkFor('changes.own@tiermode.test');
    const session = await signIn(app, 'changes.own@tiermode.test', 'first-password-2026');
    await http()
      .post('/api/auth/password')
      .set('Authorization', `Bearer ${session}`)
      .send({ currentPassword: 'first-password-2026', newPassword: 'corbel-shear-2044' })
      .expect(200);
    await setPassword(own, 'tidal-column-88-brace').expect(400);
    // The admin sets a password.
    await create('admin.sets@tiermode.test');
    const byAdmin = await linkFor('admin.sets@tiermode.test');
    const person = await userId('admin.sets@tiermode.test');
    await http()
      .patch(`/api/users/${person.id}`)
      .set('Authorization', `Bearer ${admin}`)
      .send({ version: person.version, password: 'corbel-shear-2044' })
      .expect(200);
    await setPassword(byAdmin, 'tidal-column-88-brace').expect(400);
    await signIn(app, 'admin.sets@tiermode.test', 'corbel-shear-2044');
  });

  it('kills the old link when the admin sends a new one, which works once', async () => {
    await create('resent@tiermode.test');
    const first = await linkFor('resent@tiermode.test');
    const person = await userId('resent@tiermode.test');
    await http()
      .post(`/api/users/${person.id}/set-password-link`)
      .set('Authorization', `Bearer ${admin}`)
      .expect(200);
    const mail = await waitForMail(
      app,
      admin,
      (m) => m.to === 'resent@tiermode.test' && m.subject === 'Choose a new Tiermode password',
    );
    const second = /\/set-password\?token=([A-Za-z0-9_-]+)/.exec(mail.text)![1];
    expect(second).not.toBe(first);
    await setPassword(first, 'tidal-column-88-brace').expect(400);
    await setPassword(second, 'tidal-column-88-brace').expect(204);
    await signIn(app, 'resent@tiermode.test', 'tidal-column-88-brace');
  });

  it('shows the link masked in the outbox, while the mail itself carries it', async () => {
    await create('masked@tiermode.test');
    const token = await linkFor('masked@tiermode.test');
    const outbox = (
      await http().get('/api/mail/outbox').set('Authorization', `Bearer ${admin}`).expect(200)
    ).body as { to: string; text: string }[];
    const shown = outbox.find((m) => m.to === 'masked@tiermode.test')!.text;
    expect(shown).toContain('/set-password?token=(hidden)');
    expect(shown).not.toContain(token);
  });

  it('refuses weak passwords that pass the length and common-list checks', async () => {
    await create('weak.choice@tiermode.test');
    const token = await linkFor('weak.choice@tiermode.test');
    for (const weak of ['aaaaaaaaaa', 'Password1!', '0123456789']) {
      const res = await setPassword(token, weak).expect(400);
      expect(res.body.message[0]).toMatch(/^password is too easy to guess: /);
    }
    const demo = await setPassword(token, 'tiermode-demo').expect(400);
    expect(demo.body.message).toEqual(['password is the published demo password; choose another']);
  });
});
