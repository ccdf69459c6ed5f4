import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DEMO_PASSWORD } from '../src/database/demo-accounts';
import { allKeys, createTestApp, signIn, tokenFor } from './support/test-app';
import { forgeToken, unsignedToken } from './support/tokens';

describe('Sign-in and tokens', () => {
  let app: INestApplication<App>;
  const http = () => request(app.getHttpServer());

  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(() => app.close());

  it('signs in each demo account and returns a token with its expiry and the user', async () => {
    for (const role of ['admin', 'designer', 'reviewer', 'student'] as const) {
      const res = await http()
        .post('/api/auth/login')
        .send({ email: `${role}@tiermode.test`, password: DEMO_PASSWORD })
        .expect(200);
      expect(res.body.user.role).toBe(role);
      expect(typeof res.body.accessToken).toBe('string');
      const hours = (Date.parse(res.body.expiresAt) - Date.now()) / 3_600_000;
      expect(hours).toBeGreaterThan(7.9);
      expect(hours).toBeLessThanOrEqual(8);
      expect(allKeys(res.body).some((k) => /password/i.test(k))).toBe(false);
    }
  });

  it('issues an HS256 token with issuer, audience and an 8-hour expiry', async () => {
    const token = await tokenFor(app, 'designer');
    const [header, payload] = token
      .split('.')
      .slice(0, 2)
      .map((part) => JSON.parse(Buffer.from(part, 'base64url').toString()));
    expect(header.alg).toBe('HS256');
    expect(payload.iss).toBe('tiermode');
    expect(payload.aud).toBe('tiermode-app');
    expect(payload.exp - payload.iat).toBe(8 * 3600);
  });

  it('compares the email without regard to case', async () => {
    await signIn(app, 'Reviewer@TierMode.test', DEMO_PASSWORD);
  });

  it.each([
    [{ password: DEMO_PASSWORD }, 'email must be an email address'],
    [{ email: 'not-an-email', password: DEMO_PASSWORD }, 'email must be an email address'],
    [{ email: 'admin@tiermode.test' }, 'password must be a string'],
    [{ email: 'admin@tiermode.test', password: '' }, 'password must not be empty'],
    [{ email: 'admin@tiermode.test', password: 42 }, 'password must be a string'],
    [
      { email: 'admin@tiermode.test', password: DEMO_PASSWORD, role: 'admin' },
      'property role should not exist',
    ],
  ])('refuses the login body %j with 400 naming the field', async (body, message) => {
    const res = await http().post('/api/auth/login').send(body).expect(400);
    expect(res.body.statusCode).toBe(400);
    expect(res.body.message).toContain(message);
  });

  it('answers a wrong password and an unknown email alike, without saying which was wrong', async () => {
    const wrongPassword = await http()
      .post('/api/auth/login')
      .send({ email: 'admin@tiermode.test', password: 'not-the-password' })
      .expect(401);
    const unknownEmail = await http()
      .post('/api/auth/login')
      .send({ email: 'nobody@tiermode.test', password: 'not-the-password' })
      .expect(401);
    expect(wrongPassword.body.message).toEqual(['Email or password is incorrect']);
    expect(unknownEmail.body.message).toEqual(wrongPassword.body.message);
  });

  it('GET /api/auth/me returns the user and the CASL rules of its role', async () => {
    const token = await tokenFor(app, 'student');
    const res = await http()
      .get('/api/auth/me')
      .set('Authorization', `Bearer ${token}`)
      .expect(200);
    expect(res.body.user.email).toBe('student@tiermode.test');
    expect(res.body.rules).toEqual(
      expect.arrayContaining([
        {
          action: 'read',
          subject: 'Calculation',
          conditions: { status: { $in: ['locked', 'superseded'] } },
        },
      ]),
    );
    expect(res.body.rules).not.toEqual(
      expect.arrayContaining([expect.objectContaining({ action: 'manage', subject: 'User' })]),
    );
    expect(allKeys(res.body).some((k) => /password/i.test(k))).toBe(false);
  });

  describe('refuses with 401', () => {
    let claims: { sub: string; sv: number };

    beforeAll(async () => {
      const token = await tokenFor(app, 'admin');
      const me = await http().get('/api/auth/me').set('Authorization', `Bearer ${token}`);
      claims = { sub: me.body.user.id, sv: 1 };
    });

    const cases: [string, () => string | undefined][] = [
      ['no token', () => undefined],
      ['a garbage token', () => 'not.a.jwt'],
      ['an expired token', () => forgeToken({ claims, expiresIn: -10 })],
      ['an unsigned token (alg none)', () => unsignedToken(claims)],
      [
        'a token signed with another secret',
        () => forgeToken({ claims, secret: 'another-secret-of-sufficient-length-000000' }),
      ],
      ['a token signed with another algorithm', () => forgeToken({ claims, algorithm: 'HS512' })],
      ['a token from another issuer', () => forgeToken({ claims, issuer: 'someone-else' })],
      ['a token for another audience', () => forgeToken({ claims, audience: 'another-app' })],
      ['a token without the session version', () => forgeToken({ claims: { sub: claims.sub } })],
    ];

    it.each(cases)('%s', async (_, token) => {
      const req = http().get('/api/users');
      const value = token();
      if (value) req.set('Authorization', `Bearer ${value}`);
      const res = await req.expect(401);
      expect(res.body.statusCode).toBe(401);
    });

    it('a correctly forged control token is accepted, so the cases above fail for their flaw', async () => {
      await http()
        .get('/api/users')
        .set('Authorization', `Bearer ${forgeToken({ claims })}`)
        .expect(200);
    });
  });

  it('ends every earlier token on sign-out', async () => {
    const first = await tokenFor(app, 'designer');
    const second = await tokenFor(app, 'designer');
    await http().post('/api/auth/logout').set('Authorization', `Bearer ${first}`).expect(204);
    await http().get('/api/auth/me').set('Authorization', `Bearer ${first}`).expect(401);
    await http().get('/api/auth/me').set('Authorization', `Bearer ${second}`).expect(401);
    const fresh = await tokenFor(app, 'designer');
    await http().get('/api/auth/me').set('Authorization', `Bearer ${fresh}`).expect(200);
  });

  it('ends earlier tokens on a password change and checks the current password', async () => {
    const old = await tokenFor(app, 'reviewer');
    const wrong = await http()
      .post('/api/auth/password')
      .set('Authorization', `Bearer ${old}`)
      .send({ currentPassword: 'not-the-password', newPassword: 'granite-vault-42-shear' })
      .expect(401);
    expect(wrong.body.message).toEqual(['currentPassword is incorrect']);
    const weak = await http()
      .post('/api/auth/password')
      .set('Authorization', `Bearer ${old}`)
      .send({ currentPassword: DEMO_PASSWORD, newPassword: 'password123' })
      .expect(400);
    expect(weak.body.message).toEqual([
      'newPassword is one of the most common passwords; choose another',
    ]);
    const changed = await http()
      .post('/api/auth/password')
      .set('Authorization', `Bearer ${old}`)
      .send({ currentPassword: DEMO_PASSWORD, newPassword: 'granite-vault-42-shear' })
      .expect(200);
    await http().get('/api/auth/me').set('Authorization', `Bearer ${old}`).expect(401);
    await http()
      .get('/api/auth/me')
      .set('Authorization', `Bearer ${changed.body.accessToken}`)
      .expect(200);
    await signIn(app, 'reviewer@tiermode.test', 'granite-vault-42-shear');
  });
});
