import type { Response } from 'supertest';
import { sampleInputs, useSignedInApp, ONE_PAGE_PDF } from './support/fixtures';
import { routesOf } from './support/routes';
import { signIn, type DemoRole } from './support/test-app';

/**
 * The role x action matrix: every route, called by each role on an object set up for that one
 * call, each cell asserted allowed (the route's success status) or refused (403), and every
 * non-public route refused without a token (401). "outsider" is a designer who is not a member
 * of the project, so a cell allowed to "designer" but not to "outsider" is a member-only action.
 */
type Caller = DemoRole | 'outsider';
const CALLERS: Caller[] = ['admin', 'designer', 'outsider', 'reviewer', 'student'];
const OUTSIDER = { email: 'outsider@tiermode.test', password: 'an outsider designer 2026' };

const { state, http } = useSignedInApp();
const tokens = {} as Record<Caller, string>;
const as = (caller: Caller) => ({ Authorization: `Bearer ${tokens[caller]}` });

beforeAll(async () => {
  for (const role of ['admin', 'designer', 'reviewer', 'student'] as const) {
    tokens[role] = state.tokens[role];
  }
  await http()
    .post('/api/users')
    .set(as('admin'))
    .send({ ...OUTSIDER, name: 'Ona Outsider', role: 'designer' })
    .expect(201);
  tokens.outsider = await signIn(state.app, OUTSIDER.email, OUTSIDER.password);
});

// Fixtures, each made fresh by the demo designer (a member) so that one call cannot spoil the next.
async function project(): Promise<string> {
  const res = await http()
    .post('/api/projects')
    .set(as('designer'))
    .send({ name: 'Matrix project' })
    .expect(201);
  return (res.body as { id: string }).id;
}

async function draft(): Promise<string> {
  const res = await http()
    .post(`/api/projects/${await project()}/calculations`)
    .set(as('designer'))
    .send({ title: 'Matrix calc', inputs: sampleInputs() })
    .expect(201);
  return (res.body as { id: string }).id;
}

/** A PDF kept with a fresh draft by the demo designer; its id. */
async function attachment(): Promise<string> {
  const res = await http()
    .post(`/api/calculations/${await draft()}/attachments`)
    .set(as('designer'))
    .attach('file', ONE_PAGE_PDF, 'letter.pdf')
    .expect(201);
  return (res.body as { attachments: { id: string }[] }).attachments[0].id;
}

async function submitted(): Promise<string> {
  const id = await draft();
  await http().post(`/api/calculations/${id}/analyse`).set(as('designer')).expect(200);
  await http().post(`/api/calculations/${id}/submit`).set(as('designer')).expect(200);
  return id;
}

/** A submitted calc the reviewer returned to the designer. */
async function returned(): Promise<string> {
  const id = await submitted();
  await http()
    .post(`/api/calculations/${id}/return`)
    .set(as('reviewer'))
    .send({ comment: 'Returned (matrix test).' })
    .expect(200);
  return id;
}

async function locked(): Promise<string> {
  const id = await submitted();
  await http()
    .post(`/api/calculations/${id}/lock`)
    .set(as('reviewer'))
    .send({ statement: 'Accepted (matrix test).' })
    .expect(200);
  return id;
}

async function comment(): Promise<string> {
  const id = await submitted();
  const res = await http()
    .post(`/api/calculations/${id}/comments`)
    .set(as('reviewer'))
    .send({ body: 'Check storey 2.' })
    .expect(201);
  return (res.body as { comments: { id: string }[] }).comments[0].id;
}

async function version(calcId: string): Promise<number> {
  const res = await http().get(`/api/calculations/${calcId}`).set(as('designer')).expect(200);
  return (res.body as { version: number }).version;
}

interface Cell {
  route: string;
  /** The callers allowed; everyone else gets 403. */
  allowed: Caller[];
  /** The status of an allowed call. */
  ok: number;
  call: (caller: Caller) => Promise<Response>;
  /** Public routes answer without a token. */
  public?: boolean;
}

const everyone = CALLERS;
const staff: Caller[] = ['admin', 'designer', 'outsider', 'reviewer'];
const analysisBody = {
  storeys: sampleInputs().storeys,
  spectrum: sampleInputs().spectrum,
  dampingRatio: 0.05,
};

const MATRIX: Cell[] = [
  {
    route: 'GET /api/auth/me',
    allowed: everyone,
    ok: 200,
    call: (c) => http().get('/api/auth/me').set(as(c)),
  },
  {
    route: 'GET /api/users',
    allowed: ['admin'],
    ok: 200,
    call: (c) => http().get('/api/users').set(as(c)),
  },
  {
    route: 'POST /api/users',
    allowed: ['admin'],
    ok: 201,
    call: (c) =>
      http()
        .post('/api/users')
        .set(as(c))
        .send({
          email: `new-${c}-${Date.now()}@tiermode.test`,
          name: 'New Person',
          role: 'student',
          password: 'a long enough passphrase 2026',
        }),
  },
  {
    route: 'PATCH /api/users/:id',
    allowed: ['admin'],
    ok: 200,
    call: async (c) => {
      const users = await http().get('/api/users').set(as('admin')).expect(200);
      const student = (users.body as { id: string; email: string; version: number }[]).find(
        (u) => u.email === 'student@tiermode.test',
      )!;
      return http().patch(`/api/users/${student.id}`).set(as(c)).send({ name: 'Jun Okafor' });
    },
  },
  {
    route: 'POST /api/users/:id/set-password-link',
    allowed: ['admin'],
    ok: 200,
    call: async (c) => {
      const users = await http().get('/api/users').set(as('admin')).expect(200);
      const student = (users.body as { id: string; email: string }[]).find(
        (u) => u.email === 'student@tiermode.test',
      )!;
      return http().post(`/api/users/${student.id}/set-password-link`).set(as(c));
    },
  },
  {
    route: 'GET /api/projects',
    allowed: staff,
    ok: 200,
    call: (c) => http().get('/api/projects').set(as(c)),
  },
  {
    route: 'POST /api/projects',
    allowed: ['designer', 'outsider'],
    ok: 201,
    call: (c) => http().post('/api/projects').set(as(c)).send({ name: 'Another project' }),
  },
  {
    route: 'GET /api/projects/designers',
    allowed: ['designer', 'outsider'],
    ok: 200,
    call: (c) => http().get('/api/projects/designers').set(as(c)),
  },
  {
    route: 'GET /api/projects/:id',
    allowed: staff,
    ok: 200,
    call: async (c) =>
      http()
        .get(`/api/projects/${await project()}`)
        .set(as(c)),
  },
  {
    route: 'PATCH /api/projects/:id',
    allowed: ['designer'],
    ok: 200,
    call: async (c) =>
      http()
        .patch(`/api/projects/${await project()}`)
        .set(as(c))
        .send({ site: 'Invented site' }),
  },
  {
    route: 'DELETE /api/projects/:id',
    allowed: ['designer'],
    ok: 204,
    call: async (c) =>
      http()
        .delete(`/api/projects/${await project()}`)
        .set(as(c)),
  },
  {
    route: 'GET /api/projects/:id/calculations',
    allowed: staff,
    ok: 200,
    call: async (c) =>
      http()
        .get(`/api/projects/${await project()}/calculations`)
        .set(as(c)),
  },
  {
    route: 'POST /api/projects/:id/calculations',
    allowed: ['designer'],
    ok: 201,
    call: async (c) =>
      http()
        .post(`/api/projects/${await project()}/calculations`)
        .set(as(c))
        .send({ title: 'New calc', inputs: sampleInputs() }),
  },
  {
    route: 'GET /api/calculations',
    allowed: everyone,
    ok: 200,
    call: (c) => http().get('/api/calculations').set(as(c)),
  },
  {
    route: 'GET /api/calculations/:id (draft)',
    allowed: staff,
    ok: 200,
    call: async (c) =>
      http()
        .get(`/api/calculations/${await draft()}`)
        .set(as(c)),
  },
  {
    route: 'GET /api/calculations/:id (locked)',
    allowed: everyone,
    ok: 200,
    call: async (c) =>
      http()
        .get(`/api/calculations/${await locked()}`)
        .set(as(c)),
  },
  {
    route: 'PATCH /api/calculations/:id',
    allowed: ['designer'],
    ok: 200,
    call: async (c) => {
      const id = await draft();
      return http()
        .patch(`/api/calculations/${id}`)
        .set(as(c))
        .send({ version: await version(id), title: 'Renamed' });
    },
  },
  {
    route: 'POST /api/calculations/:id/analyse',
    allowed: ['designer'],
    ok: 200,
    call: async (c) =>
      http()
        .post(`/api/calculations/${await draft()}/analyse`)
        .set(as(c)),
  },
  {
    route: 'POST /api/calculations/:id/submit',
    allowed: ['designer'],
    ok: 200,
    call: async (c) => {
      const id = await draft();
      await http().post(`/api/calculations/${id}/analyse`).set(as('designer')).expect(200);
      return http().post(`/api/calculations/${id}/submit`).set(as(c));
    },
  },
  {
    route: 'POST /api/calculations/:id/return',
    allowed: ['reviewer'],
    ok: 200,
    call: async (c) =>
      http()
        .post(`/api/calculations/${await submitted()}/return`)
        .set(as(c))
        .send({ comment: 'Please check the roof mass.' }),
  },
  {
    route: 'POST /api/calculations/:id/lock',
    allowed: ['reviewer'],
    ok: 200,
    call: async (c) =>
      http()
        .post(`/api/calculations/${await submitted()}/lock`)
        .set(as(c))
        .send({ statement: 'Accepted (matrix test).' }),
  },
  {
    route: 'POST /api/calculations/:id/revise',
    allowed: ['designer'],
    ok: 201,
    call: async (c) =>
      http()
        .post(`/api/calculations/${await locked()}/revise`)
        .set(as(c)),
  },
  {
    route: 'GET /api/calculations/:id/seal',
    allowed: everyone,
    ok: 200,
    call: async (c) =>
      http()
        .get(`/api/calculations/${await locked()}/seal`)
        .set(as(c)),
  },
  {
    route: 'GET /api/calculations/:id/modal-responses',
    allowed: everyone,
    ok: 200,
    call: async (c) =>
      http()
        .get(`/api/calculations/${await locked()}/modal-responses`)
        .set(as(c)),
  },
  {
    route: 'GET /api/calculations/:id/modal-responses (returned)',
    allowed: staff,
    ok: 200,
    call: async (c) =>
      http()
        .get(`/api/calculations/${await returned()}/modal-responses`)
        .set(as(c)),
  },
  {
    // The matrix's calcs keep no response history: allowed callers learn that (404), others 403.
    route: 'GET /api/calculations/:id/history-results',
    allowed: everyone,
    ok: 404,
    call: async (c) =>
      http()
        .get(`/api/calculations/${await locked()}/history-results`)
        .set(as(c)),
  },
  {
    route: 'GET /api/calculations/:id/changes (returned)',
    allowed: staff,
    ok: 200,
    call: async (c) =>
      http()
        .get(`/api/calculations/${await returned()}/changes?since=submission`)
        .set(as(c)),
  },
  {
    route: 'GET /api/calculations/:id/history (draft)',
    allowed: staff,
    ok: 200,
    call: async (c) =>
      http()
        .get(`/api/calculations/${await draft()}/history`)
        .set(as(c)),
  },
  {
    route: 'POST /api/calculations/:id/comments',
    allowed: ['designer', 'reviewer'],
    ok: 201,
    call: async (c) =>
      http()
        .post(`/api/calculations/${await submitted()}/comments`)
        .set(as(c))
        .send({ body: 'A remark.', target: 'storey 1' }),
  },
  {
    route: 'PATCH /api/comments/:id',
    allowed: ['designer', 'reviewer'],
    ok: 200,
    call: async (c) =>
      http()
        .patch(`/api/comments/${await comment()}`)
        .set(as(c))
        .send({ resolved: true }),
  },
  {
    route: 'GET /api/library',
    allowed: everyone,
    ok: 200,
    call: (c) => http().get('/api/library').set(as(c)),
  },
  {
    route: 'GET /api/mail/outbox',
    allowed: ['admin'],
    ok: 200,
    call: (c) => http().get('/api/mail/outbox').set(as(c)),
  },
  {
    route: 'GET /api/audit/verify',
    allowed: ['admin', 'reviewer'],
    ok: 200,
    call: (c) => http().get('/api/audit/verify').set(as(c)),
  },
  {
    route: 'POST /api/analysis',
    allowed: everyone,
    ok: 200,
    call: (c) => http().post('/api/analysis').set(as(c)).send(analysisBody),
  },
  {
    route: 'POST /api/analysis/column-stiffness',
    allowed: everyone,
    ok: 200,
    call: (c) =>
      http()
        .post('/api/analysis/column-stiffness')
        .set(as(c))
        .send({
          height: 3.5,
          columns: [
            { elasticModulus: 3e10, secondMoment: 0.002, count: 10, fixity: 'fixed-fixed' },
          ],
        }),
  },
  {
    route: 'POST /api/spectra/generate',
    allowed: everyone,
    ok: 200,
    call: (c) =>
      http()
        .post('/api/spectra/generate')
        .set(as(c))
        .send({ kind: 'asce7-two-period', sds: 1, sd1: 0.6, tl: 8 }),
  },
  {
    route: 'POST /api/free-vibration',
    allowed: everyone,
    ok: 200,
    call: (c) =>
      http()
        .post('/api/free-vibration')
        .set(as(c))
        .send({
          storeys: analysisBody.storeys,
          dampingRatio: 0.05,
          initialDisplacements: analysisBody.storeys.map(() => 0.01),
          duration: 1,
          timeStep: 0.01,
        }),
  },
  {
    route: 'POST /api/response-history',
    allowed: everyone,
    ok: 200,
    call: (c) =>
      http()
        .post('/api/response-history')
        .set(as(c))
        .send({
          storeys: analysisBody.storeys,
          dampingRatio: 0.05,
          record: { timeStep: 0.01, units: 'g', accelerations: [0, 0.1, -0.1, 0] },
        }),
  },
  {
    route: 'POST /api/record-spectrum',
    allowed: everyone,
    ok: 200,
    call: (c) =>
      http()
        .post('/api/record-spectrum')
        .set(as(c))
        .send({
          record: { timeStep: 0.01, units: 'g', accelerations: [0, 0.1, -0.1, 0] },
          dampingRatio: 0.05,
          periods: [0.5, 1],
        }),
  },
  {
    route: 'GET /api/records/demo',
    allowed: everyone,
    ok: 200,
    call: (c) => http().get('/api/records/demo').set(as(c)),
  },
  {
    route: 'POST /api/imports/record',
    allowed: everyone,
    ok: 200,
    call: (c) =>
      http()
        .post('/api/imports/record')
        .set(as(c))
        .field('units', 'g')
        .field('timeStep', '0.01')
        .attach('file', Buffer.from('0\n0.1\n-0.1\n0\n'), 'record.txt'),
  },
  {
    route: 'POST /api/imports/storeys',
    allowed: everyone,
    ok: 200,
    call: (c) =>
      http()
        .post('/api/imports/storeys')
        .set(as(c))
        .field('units', 'SI')
        .attach(
          'file',
          Buffer.from('Label,Height (m),Mass (t),Stiffness (kN/m)\nL1,3.5,300,400000\n'),
          'storeys.csv',
        ),
  },
  {
    route: 'POST /api/imports/spectrum',
    allowed: everyone,
    ok: 200,
    call: (c) =>
      http()
        .post('/api/imports/spectrum')
        .set(as(c))
        .attach('file', Buffer.from('Period (s),Sa (g)\n0,0.4\n1,1\n'), 'spectrum.csv'),
  },
  {
    route: 'GET /api/imports/storeys/template.csv',
    allowed: everyone,
    ok: 200,
    call: (c) => http().get('/api/imports/storeys/template.csv').set(as(c)),
  },
  {
    route: 'GET /api/imports/storeys/template.xlsx',
    allowed: everyone,
    ok: 200,
    call: (c) => http().get('/api/imports/storeys/template.xlsx').set(as(c)),
  },
  {
    route: 'GET /api/calculations/:id/results.csv',
    allowed: everyone,
    ok: 200,
    call: async (c) =>
      http()
        .get(`/api/calculations/${await locked()}/results.csv?table=modes`)
        .set(as(c)),
  },
  {
    route: 'GET /api/calculations/:id/results.xlsx',
    allowed: everyone,
    ok: 200,
    call: async (c) =>
      http()
        .get(`/api/calculations/${await locked()}/results.xlsx`)
        .set(as(c)),
  },
  {
    route: 'GET /api/calculations/:id/export.json',
    allowed: staff,
    ok: 200,
    call: async (c) =>
      http()
        .get(`/api/calculations/${await draft()}/export.json`)
        .set(as(c)),
  },
  {
    route: 'POST /api/projects/:id/calculations/import',
    allowed: ['designer'],
    ok: 201,
    call: async (c) => {
      const source = await http()
        .get(`/api/calculations/${await draft()}/export.json`)
        .set(as('designer'));
      return http()
        .post(`/api/projects/${await project()}/calculations/import`)
        .set(as(c))
        .send(source.body);
    },
  },
  {
    route: 'GET /api/calculations/:id/report.pdf',
    allowed: everyone,
    ok: 200,
    call: async (c) =>
      http()
        .get(`/api/calculations/${await locked()}/report.pdf`)
        .set(as(c)),
  },
  {
    route: 'POST /api/calculations/:id/attachments',
    allowed: ['designer'],
    ok: 201,
    call: async (c) =>
      http()
        .post(`/api/calculations/${await draft()}/attachments`)
        .set(as(c))
        .attach('file', ONE_PAGE_PDF, 'letter.pdf'),
  },
  {
    route: 'GET /api/attachments/:id',
    allowed: staff,
    ok: 200,
    call: async (c) =>
      http()
        .get(`/api/attachments/${await attachment()}`)
        .set(as(c)),
  },
  {
    route: 'DELETE /api/attachments/:id',
    allowed: ['designer'],
    ok: 200,
    call: async (c) =>
      http()
        .delete(`/api/attachments/${await attachment()}`)
        .set(as(c)),
  },
  {
    route: 'DELETE /api/calculations/:id',
    allowed: ['designer'],
    ok: 204,
    call: async (c) =>
      http()
        .delete(`/api/calculations/${await draft()}`)
        .set(as(c)),
  },
  {
    route: 'POST /api/checks',
    allowed: everyone,
    ok: 200,
    call: (c) =>
      http()
        .post('/api/checks')
        .set(as(c))
        .send({
          ...analysisBody,
          basis: {
            code: 'USER',
            scaleFactor: 1,
            driftLimitRatio: 0.02,
            deflectionAmplification: 1,
            stabilityLimit: 0.25,
          },
        }),
  },
  {
    route: 'GET /api/verification',
    allowed: everyone,
    ok: 200,
    call: (c) => http().get('/api/verification').set(as(c)),
  },
];

describe('the role x action matrix', () => {
  const cells = MATRIX.flatMap((cell) =>
    CALLERS.map((caller) => [cell.route, caller, cell] as const),
  );

  it.each(cells)('%s as %s', async (_route, caller, cell) => {
    const res = await cell.call(caller);
    const expected = cell.allowed.includes(caller) ? cell.ok : 403;
    if (res.status !== expected) {
      throw new Error(
        `${cell.route} as ${caller}: ${res.status} ${JSON.stringify(res.body).slice(0, 300)}`,
      );
    }
    expect(res.status).toBe(expected);
  });

  it('covers every route the API declares', () => {
    const declared = new Set(
      MATRIX.map((cell) => cell.route.replace(/ \(.*\)$/, '')).concat([
        // Public or own-account routes, checked elsewhere (auth.e2e-spec, set-password.e2e-spec).
        'POST /api/auth/login',
        'POST /api/auth/logout',
        'POST /api/auth/password',
        'POST /api/auth/set-password',
        'GET /api/health',
        // Public: the seal's public key (seal-signature.e2e-spec).
        'GET /api/seal/public-key',
      ]),
    );
    const routes = routesOf(state.app);
    expect(routes.size).toBeGreaterThan(30);
    expect([...routes].filter((r) => !declared.has(r))).toEqual([]);
  });

  it.each(MATRIX.filter((cell) => !cell.public).map((cell) => [cell.route, cell] as const))(
    '%s without a token gets 401',
    async (_route, cell) => {
      const [method, path] = cell.route.split(' ');
      const url = path.replace(/:id/g, '00000000-0000-4000-8000-000000000000');
      const res = await http()[method.toLowerCase() as 'get' | 'post' | 'patch' | 'delete'](url);
      expect(res.status).toBe(401);
    },
  );
});
