import type { AuditEventDto, CalculationDto } from '@tiermode/shared-types';
import { sampleInputs, useSignedInApp, ONE_PAGE_PDF, calcInState } from './support/fixtures';

/**
 * State changes that arrive at the same moment: exactly one wins, the others get 409, and
 * nothing lands on a calc after it is sealed. 50 requests at once, through one server process
 * (two-server races are in processes/durability.process-spec.ts).
 */
const { http, as } = useSignedInApp();
const PARALLEL = 50;

const signedIn = { http, as };
const submittedCalc = (title: string) => calcInState(signedIn, 'submitted', title);
const lockedCalc = (title: string) => calcInState(signedIn, 'locked', title);

const history = async (id: string) =>
  (await http().get(`/api/calculations/${id}/history`).set(as('designer')).expect(200))
    .body as AuditEventDto[];

const statuses = (responses: { status: number }[]) =>
  responses.map((r) => r.status).sort((a, b) => a - b);

describe(`${PARALLEL} requests at once`, () => {
  it('revise: exactly one next revision exists, the rest get 409', async () => {
    const calc = await lockedCalc('Revise race');
    const results = await Promise.all(
      Array.from({ length: PARALLEL }, () =>
        http().post(`/api/calculations/${calc.id}/revise`).set(as('designer')),
      ),
    );
    expect(statuses(results)).toEqual([201, ...Array(PARALLEL - 1).fill(409)]);
    for (const refused of results.filter((r) => r.status === 409)) {
      expect(refused.body.message[0]).toMatch(/^Revision 2 of this calculation already exists/);
    }
    const all = (
      await http()
        .get(`/api/projects/${calc.projectId}/calculations`)
        .set(as('designer'))
        .expect(200)
    ).body as CalculationDto[];
    expect(all.map((c) => `${c.revision} ${c.status}`).sort()).toEqual(['1 locked', '2 draft']);
  });

  it('lock: one seal, one lock event; the rest get 409', async () => {
    const calc = await submittedCalc('Lock race');
    const results = await Promise.all(
      Array.from({ length: PARALLEL }, (_, i) =>
        http()
          .post(`/api/calculations/${calc.id}/lock`)
          .set(as('reviewer'))
          .send({ statement: `Checked, attempt ${i}.` }),
      ),
    );
    expect(statuses(results)).toEqual([200, ...Array(PARALLEL - 1).fill(409)]);
    const winner = results.find((r) => r.status === 200)!.body as CalculationDto;
    const seal = await http()
      .get(`/api/calculations/${calc.id}/seal`)
      .set(as('designer'))
      .expect(200);
    expect(seal.body.valid).toBe(true);
    expect(seal.body.seal.statement).toBe(winner.seal?.statement);
    expect((await history(calc.id)).filter((e) => e.action === 'locked')).toHaveLength(1);
  });

  it('comments sent with a lock: each is stored before the lock or refused, none after', async () => {
    const calc = await submittedCalc('Comment race');
    const comments = Array.from({ length: PARALLEL }, (_, i) =>
      http()
        .post(`/api/calculations/${calc.id}/comments`)
        .set(as(i % 2 ? 'reviewer' : 'designer'))
        .send({ body: `Comment ${i}` }),
    );
    const lock = http()
      .post(`/api/calculations/${calc.id}/lock`)
      .set(as('reviewer'))
      .send({ statement: 'Checked independently.' });
    const [locked, ...results] = await Promise.all([lock, ...comments]);
    expect(locked.status).toBe(200);
    const stored = results.filter((r) => r.status === 201).length;
    for (const refused of results.filter((r) => r.status !== 201)) {
      expect(refused.status).toBe(409);
      expect(refused.body.message[0]).toMatch(/locked/);
    }
    const events = await history(calc.id);
    const lockSeq = events.find((e) => e.action === 'locked')!.seq;
    const commented = events.filter((e) => e.action === 'commented');
    expect(commented).toHaveLength(stored);
    for (const event of commented) expect(event.seq).toBeLessThan(lockSeq);
    const after = (await http().get(`/api/calculations/${calc.id}`).set(as('designer')).expect(200))
      .body as CalculationDto;
    expect(after.comments).toHaveLength(stored);
  });

  it('attachments sent with a submit: each lands on the draft before the submit or is refused', async () => {
    const project = await http()
      .post('/api/projects')
      .set(as('designer'))
      .send({ name: 'Attach race' })
      .expect(201);
    const draft = await http()
      .post(`/api/projects/${project.body.id}/calculations`)
      .set(as('designer'))
      .send({ title: 'Attach race', inputs: sampleInputs() })
      .expect(201);
    const id = draft.body.id as string;
    await http().post(`/api/calculations/${id}/analyse`).set(as('designer')).expect(200);
    const uploads = Array.from({ length: 20 }, (_, i) =>
      http()
        .post(`/api/calculations/${id}/attachments`)
        .set(as('designer'))
        .attach('file', ONE_PAGE_PDF, `letter-${i}.pdf`),
    );
    const submit = http().post(`/api/calculations/${id}/submit`).set(as('designer'));
    const [submitted, ...results] = await Promise.all([submit, ...uploads]);
    expect(submitted.status).toBe(200);
    const stored = results.filter((r) => r.status === 201).length;
    for (const refused of results.filter((r) => r.status !== 201)) {
      expect(refused.status).toBe(409);
    }
    const events = await history(id);
    const submitSeq = events.find((e) => e.action === 'submitted')!.seq;
    const attached = events.filter((e) => e.action === 'attached');
    expect(attached).toHaveLength(stored);
    for (const event of attached) expect(event.seq).toBeLessThan(submitSeq);
    const after = (await http().get(`/api/calculations/${id}`).set(as('designer')).expect(200))
      .body as CalculationDto;
    expect(after.attachments).toHaveLength(stored);
  });
});

describe('Independence of the reviewer who locks', () => {
  it('refuses a lock from a reviewer who edited, analysed or submitted any revision of the calc', async () => {
    const password = 'bearing-wall-2026-x';
    const colleague = await http()
      .post('/api/users')
      .set(as('admin'))
      .send({
        email: 'colleague@tiermode.test',
        name: 'Rowan Colleague',
        role: 'designer',
        password,
      })
      .expect(201);
    const project = await http()
      .post('/api/projects')
      .set(as('designer'))
      .send({ name: 'Independence' })
      .expect(201);
    const designerId = (await http().get('/api/auth/me').set(as('designer')).expect(200)).body.user
      .id as string;
    await http()
      .patch(`/api/projects/${project.body.id}`)
      .set(as('designer'))
      .send({ version: project.body.version, memberIds: [designerId, colleague.body.id] })
      .expect(200);
    const calc = await http()
      .post(`/api/projects/${project.body.id}/calculations`)
      .set(as('designer'))
      .send({ title: 'Reworked by a colleague', inputs: sampleInputs() })
      .expect(201);
    const signIn = async () =>
      (
        await http()
          .post('/api/auth/login')
          .send({ email: 'colleague@tiermode.test', password })
          .expect(200)
      ).body.accessToken as string;
    // The colleague rewrites, analyses and submits the designer's calc...
    let token = await signIn();
    await http()
      .patch(`/api/calculations/${calc.body.id}`)
      .set({ Authorization: `Bearer ${token}` })
      .send({ version: calc.body.version, title: 'Reworked by a colleague, rev A' })
      .expect(200);
    await http()
      .post(`/api/calculations/${calc.body.id}/analyse`)
      .set({ Authorization: `Bearer ${token}` })
      .expect(200);
    await http()
      .post(`/api/calculations/${calc.body.id}/submit`)
      .set({ Authorization: `Bearer ${token}` })
      .expect(200);
    // ...and is later made a licensed reviewer.
    const user = (await http().get('/api/users').set(as('admin')).expect(200)).body.find(
      (u: { email: string }) => u.email === 'colleague@tiermode.test',
    );
    await http()
      .patch(`/api/users/${user.id}`)
      .set(as('admin'))
      .send({
        version: user.version,
        role: 'reviewer',
        licenseNumber: 'SE-4711',
        licenseJurisdiction: 'Invented State',
        licenseExpiresOn: '2031-01-01',
      })
      .expect(200);
    token = await signIn();
    const refused = await http()
      .post(`/api/calculations/${calc.body.id}/lock`)
      .set({ Authorization: `Bearer ${token}` })
      .send({ statement: 'Accepted.' })
      .expect(403);
    expect(refused.body.message).toEqual([
      'You wrote, edited, analysed or submitted a revision of this calculation, so you cannot lock it: the lock must come from an independent reviewer',
    ]);
    // An independent reviewer locks it; the next revision, made by the designer alone, is
    // still out of the colleague's reach, since they worked on revision 1.
    await http()
      .post(`/api/calculations/${calc.body.id}/lock`)
      .set(as('reviewer'))
      .send({ statement: 'Accepted.' })
      .expect(200);
    const next = await http()
      .post(`/api/calculations/${calc.body.id}/revise`)
      .set(as('designer'))
      .expect(201);
    await http().post(`/api/calculations/${next.body.id}/analyse`).set(as('designer')).expect(200);
    await http().post(`/api/calculations/${next.body.id}/submit`).set(as('designer')).expect(200);
    await http()
      .post(`/api/calculations/${next.body.id}/lock`)
      .set({ Authorization: `Bearer ${token}` })
      .send({ statement: 'Accepted.' })
      .expect(403);
    await http()
      .post(`/api/calculations/${next.body.id}/lock`)
      .set(as('reviewer'))
      .send({ statement: 'Accepted.' })
      .expect(200);
  });
});
