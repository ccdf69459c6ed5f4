import type { INestApplication, LoggerService } from '@nestjs/common';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { Test } from '@nestjs/testing';
import type { CalculationDto, MailMessageDto, ProjectDto } from '@tiermode/shared-types';
import request from 'supertest';
import type { App } from 'supertest/types';
import { AppModule } from '../src/app.module';
import { configureApp } from '../src/app.setup';
import { sampleInputs, waitForMail } from './support/fixtures';
import { forgeToken } from './support/tokens';

/**
 * Hardening checks gathered in one place. Elsewhere: forged and expired tokens (auth), a
 * deactivated user locked out at once (users), other projects' and roles' objects refused on
 * every id route (access-matrix, the "outsider" column), set-password links single-use and
 * expiring (set-password), common and short passwords (password-policy, set-password), uploads
 * (imports, attachments), generated hostile payloads (properties).
 */

/** Every line any part of the app logs, at every level, and whatever reaches stdout/stderr. */
class CapturingLogger implements LoggerService {
  readonly lines: string[] = [];
  private keep = (...parts: unknown[]) =>
    this.lines.push(parts.map((p) => (typeof p === 'string' ? p : JSON.stringify(p))).join(' '));
  log = this.keep;
  error = this.keep;
  warn = this.keep;
  debug = this.keep;
  verbose = this.keep;
  fatal = this.keep;
}

const logger = new CapturingLogger();
const written: string[] = [];
let app: INestApplication<App>;
const http = () => request(app.getHttpServer());

beforeAll(async () => {
  for (const stream of [process.stdout, process.stderr]) {
    const write = stream.write.bind(stream) as (...args: unknown[]) => boolean;
    jest.spyOn(stream, 'write').mockImplementation((...args: unknown[]) => {
      written.push(String(args[0]));
      return write(...args);
    });
  }
  const moduleRef = await Test.createTestingModule({ imports: [AppModule] }).compile();
  app = configureApp(moduleRef.createNestApplication<NestExpressApplication>({ logger }));
  await app.init();
});

afterAll(async () => {
  await app.close();
  jest.restoreAllMocks();
});

const login = (email: string, password: string) =>
  http().post('/api/auth/login').send({ email, password });

describe('Headers and origins', () => {
  it('sends helmet’s security headers on API answers and on the web app', async () => {
    for (const path of ['/api/health', '/api/docs']) {
      const res = await http().get(path).redirects(1);
      expect(res.headers).toMatchObject({
        'x-content-type-options': 'nosniff',
        'x-frame-options': 'SAMEORIGIN',
        'referrer-policy': 'no-referrer',
        'cross-origin-opener-policy': 'same-origin',
        'cross-origin-resource-policy': 'same-origin',
        'strict-transport-security': expect.stringContaining('max-age='),
      });
      const csp = res.headers['content-security-policy'];
      expect(csp).toContain("default-src 'self'");
      expect(csp).toContain("script-src 'self'");
      expect(csp).toContain("object-src 'none'");
      expect(csp).toContain("frame-ancestors 'self'");
      expect(res.headers['x-powered-by']).toBeUndefined();
    }
  });

  it('gives another origin no CORS permission, for a preflight or a plain request', async () => {
    const preflight = await http()
      .options('/api/projects')
      .set('Origin', 'https://elsewhere.example')
      .set('Access-Control-Request-Method', 'PATCH')
      .set('Access-Control-Request-Headers', 'authorization,content-type');
    expect(preflight.headers['access-control-allow-origin']).toBeUndefined();
    expect(preflight.headers['access-control-allow-methods']).toBeUndefined();
    const token = (await login('designer@tiermode.test', 'tiermode-demo').expect(200)).body
      .accessToken as string;
    const plain = await http()
      .get('/api/projects')
      .set('Origin', 'https://elsewhere.example')
      .set('Authorization', `Bearer ${token}`);
    expect(plain.headers['access-control-allow-origin']).toBeUndefined();
    expect(plain.headers['access-control-allow-credentials']).toBeUndefined();
  });
});

describe('Tokens', () => {
  it('refuses a token whose payload was changed after signing (another user, another role)', async () => {
    const res = await login('student@tiermode.test', 'tiermode-demo').expect(200);
    const token = res.body.accessToken as string;
    const admin = (await login('admin@tiermode.test', 'tiermode-demo').expect(200)).body;
    const [header, payload, signature] = token.split('.');
    const claims = JSON.parse(Buffer.from(payload, 'base64url').toString());
    for (const changed of [
      { ...claims, sub: admin.user.id },
      { ...claims, role: 'admin' },
      { ...claims, exp: claims.exp + 3600 },
    ]) {
      const tampered = `${header}.${Buffer.from(JSON.stringify(changed)).toString('base64url')}.${signature}`;
      await http().get('/api/users').set('Authorization', `Bearer ${tampered}`).expect(401);
    }
    // The untouched token still works, so it is the change that is refused.
    await http().get('/api/auth/me').set('Authorization', `Bearer ${token}`).expect(200);
  });

  /** A designer the admin has just added, signed in: the admin's token, the user, its token. */
  async function newDesigner(email: string, name: string, password: string) {
    const adminToken = (await login('admin@tiermode.test', 'tiermode-demo').expect(200)).body
      .accessToken as string;
    const made = await http()
      .post('/api/users')
      .set('Authorization', `Bearer ${adminToken}`)
      .send({ email, name, role: 'designer', password })
      .expect(201);
    const token = (await login(email, password).expect(200)).body.accessToken as string;
    return { adminToken, made, token };
  }

  it('refuses a well-signed token once the user is deactivated, on the very next request', async () => {
    const { adminToken, made, token } = await newDesigner(
      'leaver@tiermode.test',
      'Lee Leaver',
      'leaving-soon-2026',
    );
    await http().get('/api/projects').set('Authorization', `Bearer ${token}`).expect(200);
    await http()
      .patch(`/api/users/${made.body.id}`)
      .set('Authorization', `Bearer ${adminToken}`)
      .send({ version: made.body.version, active: false })
      .expect(200);
    await http().get('/api/projects').set('Authorization', `Bearer ${token}`).expect(401);
    // A fresh token forged with the right secret and claims is refused too: the check is the
    // user's record, not the token alone.
    const forged = forgeToken({ claims: { sub: made.body.id, sv: 1 } });
    await http().get('/api/projects').set('Authorization', `Bearer ${forged}`).expect(401);
  });

  it('applies a role change and a sign-out on the very next request, though the user is kept in memory', async () => {
    const { adminToken, made, token } = await newDesigner(
      'mover@tiermode.test',
      'Mo Mover',
      'moving-desks-2026',
    );
    const bearer = { Authorization: `Bearer ${token}` };
    // Twice, so the second is answered from the row kept since the first.
    await http().post('/api/projects').set(bearer).send({ name: 'Mine' }).expect(201);
    await http().post('/api/projects').set(bearer).send({ name: 'Mine too' }).expect(201);
    await http()
      .patch(`/api/users/${made.body.id}`)
      .set('Authorization', `Bearer ${adminToken}`)
      .send({ version: made.body.version, role: 'student' })
      .expect(200);
    await http().post('/api/projects').set(bearer).send({ name: 'Not now' }).expect(403);
    const me = await http().get('/api/auth/me').set(bearer).expect(200);
    expect(me.body.user.role).toBe('student');
    await http().post('/api/auth/logout').set(bearer).expect(204);
    await http().get('/api/auth/me').set(bearer).expect(401);
  });
});

describe('Hostile text', () => {
  const SCRIPT = '<script>window.__tiermodeXss = 1</script>';
  const SQL = "Robert'); DROP TABLE calculations; --";
  const IMG = '"><img src=x onerror="window.__tiermodeXss=2">';

  it('stores script tags and SQL fragments as plain text and gives them back unchanged', async () => {
    const token = (await login('designer@tiermode.test', 'tiermode-demo').expect(200)).body
      .accessToken as string;
    const auth = { Authorization: `Bearer ${token}` };
    const project = (
      await http()
        .post('/api/projects')
        .set(auth)
        .send({ name: SCRIPT, site: SQL, structuralSystem: IMG })
        .expect(201)
    ).body as ProjectDto;
    const inputs = sampleInputs();
    inputs.storeys[1].label = '<svg onload=alert(1)>';
    const calc = (
      await http()
        .post(`/api/projects/${project.id}/calculations`)
        .set(auth)
        .send({ title: SQL, inputs })
        .expect(201)
    ).body as CalculationDto;
    const stored = (await http().get(`/api/calculations/${calc.id}`).set(auth).expect(200))
      .body as CalculationDto;
    expect(stored.title).toBe(SQL);
    expect(stored.inputs.storeys[1].label).toBe('<svg onload=alert(1)>');
    const again = (await http().get(`/api/projects/${project.id}`).set(auth).expect(200))
      .body as ProjectDto;
    expect([again.name, again.site, again.structuralSystem]).toEqual([SCRIPT, SQL, IMG]);
    // The table the fragment names is still there, with every calc in it.
    const list = await http().get('/api/calculations').set(auth).expect(200);
    expect(list.body.map((c: { id: string }) => c.id)).toContain(calc.id);
    // And a fragment where an id belongs is refused before it reaches a query.
    await http()
      .get(`/api/calculations?projectId=${encodeURIComponent("' OR 1=1 --")}`)
      .set(auth)
      .expect(400);
    await http()
      .get(`/api/calculations/${encodeURIComponent("1' OR '1'='1")}`)
      .set(auth)
      .expect(400);
  });
});

describe('Logs', () => {
  it('never show a password, a token, a password hash, the signing secret or a set-password link', async () => {
    const secrets: string[] = [process.env.JWT_SECRET as string, 'tiermode-demo'];
    const wrong = 'not-my-password-9931';
    secrets.push(wrong);
    await login('designer@tiermode.test', wrong).expect(401);
    const admin = await login('admin@tiermode.test', 'tiermode-demo').expect(200);
    const adminToken = admin.body.accessToken as string;
    secrets.push(adminToken);
    const first = 'first-password-for-logs-77';
    secrets.push(first);
    await http()
      .post('/api/users')
      .set('Authorization', `Bearer ${adminToken}`)
      .send({ email: 'logs@tiermode.test', name: 'Lo Gs', role: 'designer', password: first })
      .expect(201);
    const mail: MailMessageDto = await waitForMail(app, adminToken, (m) =>
      m.to.includes('logs@tiermode.test'),
    );
    const link = /set-password\?token=([\w-]+)/.exec(mail.text)?.[1];
    expect(link).toBeDefined();
    secrets.push(link!);
    const chosen = 'chosen-password-for-logs-88';
    secrets.push(chosen);
    await http().post('/api/auth/set-password').send({ token: link, password: chosen }).expect(204);
    const signedIn = await login('logs@tiermode.test', chosen).expect(200);
    secrets.push(signedIn.body.accessToken);
    const changed = 'changed-password-for-logs-99';
    secrets.push(changed);
    await http()
      .post('/api/auth/password')
      .set('Authorization', `Bearer ${signedIn.body.accessToken}`)
      .send({ currentPassword: chosen, newPassword: changed })
      .expect(200);
    // A request that goes wrong inside is logged: the log says what, not with what.
    await http()
      .post('/api/auth/login')
      .set('Content-Type', 'application/json')
      .send(`{"email":"x@tiermode.test","password":"${wrong}"`)
      .expect(400);

    const everything = [...logger.lines, ...written].join('\n');
    expect(logger.lines.length + written.length).toBeGreaterThan(0);
    for (const secret of secrets) expect(everything).not.toContain(secret);
    expect(everything).not.toMatch(/\$2[aby]\$\d\d\$/);
    expect(everything).not.toMatch(/password_hash|passwordHash/);
  });
});
