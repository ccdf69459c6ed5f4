import type {
  AuditEventDto,
  CalculationChanges,
  CalculationDto,
  CalculationSummaryDto,
  MailMessageDto,
} from '@tiermode/shared-types';
import {
  ASCE_BASIS,
  calcInState,
  sampleInputs,
  useSignedInApp,
  waitForMail,
} from './support/fixtures';

const signedIn = useSignedInApp();
const { state, http, as } = signedIn;

const get = <T>(path: string, role: 'designer' | 'reviewer' | 'student' | 'admin' = 'designer') =>
  http()
    .get(path)
    .set(as(role))
    .then((r) => r.body as T);

/** Saves new inputs (and optionally a basis) on a draft, at its current version. */
async function edit(id: string, change: object) {
  const current = await get<CalculationDto>(`/api/calculations/${id}`);
  return http()
    .patch(`/api/calculations/${id}`)
    .set(as('designer'))
    .send({ version: current.version, ...change })
    .expect(200);
}

describe('What changed since the last submission, and since the previous revision', () => {
  it('compares with the submission the reviewer returned, storey by storey and field by field', async () => {
    const calc = await calcInState(signedIn, 'submitted', 'Changes since submission');
    // A first submission has nothing to be compared with.
    const first = await http()
      .get(`/api/calculations/${calc.id}/changes?since=submission`)
      .set(as('reviewer'))
      .expect(409);
    expect(first.body.message[0]).toContain('has not been returned by a reviewer yet');
    await http()
      .post(`/api/calculations/${calc.id}/return`)
      .set(as('reviewer'))
      .send({ comment: 'Storey 2 looks heavy.' })
      .expect(200);
    const none = await http()
      .get(`/api/calculations/${calc.id}/changes?since=submission`)
      .set(as('designer'))
      .expect(200);
    expect((none.body as CalculationChanges).unchanged).toBe(true);

    const inputs = sampleInputs();
    inputs.storeys[1].mass = 250_000;
    inputs.storeys.push({ mass: 100_000, stiffness: 2e8, height: 3 });
    inputs.spectrum.points[1] = { period: 0.5, sa: 1.1 };
    inputs.dampingRatio = 0.04;
    await edit(calc.id, { inputs, basis: ASCE_BASIS });
    // Resubmitted: the reviewer sees what changed since the submission they returned.
    await http().post(`/api/calculations/${calc.id}/analyse`).set(as('designer')).expect(200);
    await http().post(`/api/calculations/${calc.id}/submit`).set(as('designer')).expect(200);

    const changes = (
      await http()
        .get(`/api/calculations/${calc.id}/changes?since=submission`)
        .set(as('reviewer'))
        .expect(200)
    ).body as CalculationChanges;
    expect(changes.since).toBe('submission');
    expect(changes.baseline).toMatchObject({ calculationId: calc.id, revision: 1 });
    expect(changes.unchanged).toBe(false);
    expect(changes.storeys).toEqual([
      { storey: 2, kind: 'changed', fields: [{ field: 'mass', old: 280_000, new: 250_000 }] },
      expect.objectContaining({ storey: 4, kind: 'added' }),
    ]);
    expect(changes.spectrum).toEqual([
      { field: 'points[2]', old: { period: 0.5, sa: 1 }, new: { period: 0.5, sa: 1.1 } },
    ]);
    expect(changes.basis).toEqual([{ field: 'basis', old: null, new: ASCE_BASIS }]);
    expect(changes.settings).toEqual([{ field: 'dampingRatio', old: 0.05, new: 0.04 }]);

    // The audit trail names what the edit changed.
    const history = await get<AuditEventDto[]>(`/api/calculations/${calc.id}/history`);
    const edited = history.filter((e) => e.action === 'edited').pop()!;
    expect(edited.detail?.changes).toEqual([
      'storey 2 mass',
      'storey 4 added',
      'spectrum points',
      'basis',
      'damping',
    ]);
  });

  it('compares a revision with the locked revision it came from', async () => {
    const locked = await calcInState(signedIn, 'locked', 'Changes since revision');
    const revised = (
      await http().post(`/api/calculations/${locked.id}/revise`).set(as('designer')).expect(201)
    ).body as CalculationDto;
    const inputs = sampleInputs();
    inputs.storeys[0].stiffness = 5e8;
    inputs.storeys[2].label = 'Roof';
    await edit(revised.id, { inputs });
    const changes = (
      await http()
        .get(`/api/calculations/${revised.id}/changes?since=revision`)
        .set(as('designer'))
        .expect(200)
    ).body as CalculationChanges;
    expect(changes.baseline).toMatchObject({ calculationId: locked.id, revision: 1 });
    expect(changes.storeys).toEqual([
      { storey: 1, kind: 'changed', fields: [{ field: 'stiffness', old: 4e8, new: 5e8 }] },
      { storey: 3, kind: 'changed', fields: [{ field: 'label', old: '', new: 'Roof' }] },
    ]);
    // Revision 1 now links to revision 2 instead of offering to start it.
    const first = await get<CalculationDto>(`/api/calculations/${locked.id}`);
    expect(first.nextRevision).toEqual({ id: revised.id, revision: 2, status: 'draft' });
    expect(revised.nextRevision).toBeNull();
  });

  it('says why there is nothing to compare with, and refuses an unknown "since"', async () => {
    const draft = await calcInState(signedIn, 'draft', 'Nothing to compare');
    const never = await http()
      .get(`/api/calculations/${draft.id}/changes?since=submission`)
      .set(as('designer'))
      .expect(409);
    expect(never.body.message).toEqual([
      'This calculation has not been submitted yet: nothing to compare with',
    ]);
    const first = await http()
      .get(`/api/calculations/${draft.id}/changes?since=revision`)
      .set(as('designer'))
      .expect(409);
    expect(first.body.message[0]).toContain('This is revision 1');
    const bad = await http()
      .get(`/api/calculations/${draft.id}/changes?since=yesterday`)
      .set(as('designer'))
      .expect(400);
    expect(bad.body.message).toEqual(['since must be one of submission, revision']);
    // A student reads locked calcs only.
    await http()
      .get(`/api/calculations/${draft.id}/changes?since=submission`)
      .set(as('student'))
      .expect(403);
  });
});

describe('Comments tied to a storey, and replies', () => {
  it('ties a comment to a storey, takes a reply, and flattens a reply to a reply', async () => {
    const calc = await calcInState(signedIn, 'submitted', 'Storey comments');
    const first = (
      await http()
        .post(`/api/calculations/${calc.id}/comments`)
        .set(as('reviewer'))
        .send({ body: 'Is this mass right?', storey: 2 })
        .expect(201)
    ).body as CalculationDto;
    const comment = first.comments[0];
    expect(comment).toMatchObject({ storey: 2, target: 'storey 2', parentId: null });
    const reply = (
      await http()
        .post(`/api/calculations/${calc.id}/comments`)
        .set(as('designer'))
        .send({ body: 'Yes: plant on that floor.', parentId: comment.id })
        .expect(201)
    ).body as CalculationDto;
    const answer = reply.comments.find((c) => c.body.startsWith('Yes'))!;
    // A reply takes its comment's storey.
    expect(answer).toMatchObject({ parentId: comment.id, storey: 2 });
    const again = (
      await http()
        .post(`/api/calculations/${calc.id}/comments`)
        .set(as('reviewer'))
        .send({ body: 'Thanks, agreed.', parentId: answer.id })
        .expect(201)
    ).body as CalculationDto;
    expect(again.comments.find((c) => c.body === 'Thanks, agreed.')!.parentId).toBe(comment.id);
    const history = await get<AuditEventDto[]>(`/api/calculations/${calc.id}/history`);
    expect(history.filter((e) => e.action === 'replied')).toHaveLength(2);
  });

  it.each([
    [{ body: 'x', storey: 4 }, 'storey must be at most 3 (this calc has 3 storeys; 1 = the base)'],
    [{ body: 'x', storey: 0 }, 'storey must be 1 or more (1 = the base)'],
    [{ body: 'x', storey: 1.5 }, 'storey must be a whole number (1 = the base)'],
    [
      { body: 'x', parentId: '00000000-0000-4000-8000-000000000000' },
      'parentId must be the id of a comment on this calculation',
    ],
    [
      { body: 'x', parentId: 'not-an-id' },
      'parentId must be the id of a comment on this calculation',
    ],
  ])('refuses %j, naming the field', async (body, message) => {
    const calc = await calcInState(
      signedIn,
      'submitted',
      `Refused comment ${JSON.stringify(body)}`,
    );
    const res = await http()
      .post(`/api/calculations/${calc.id}/comments`)
      .set(as('reviewer'))
      .send(body)
      .expect(400);
    expect(res.body.message).toEqual([message]);
  });
});

describe('A returned calc on the dashboard and in the mail', () => {
  it('counts its open comments and mails them with a link to the calc and the caution line', async () => {
    const calc = await calcInState(signedIn, 'submitted', 'Returned with three');
    for (const [body, storey] of [
      ['Check storey 1 stiffness.', 1],
      ['Roof mass seems low.', 3],
    ] as const) {
      await http()
        .post(`/api/calculations/${calc.id}/comments`)
        .set(as('reviewer'))
        .send({ body, storey })
        .expect(201);
    }
    await http()
      .post(`/api/calculations/${calc.id}/return`)
      .set(as('reviewer'))
      .send({ comment: 'Please look at the two storey comments.' })
      .expect(200);
    const mine = await get<CalculationSummaryDto[]>('/api/calculations?author=me&status=draft');
    const summary = mine.find((c) => c.id === calc.id)!;
    expect(summary.openComments).toBe(3);
    expect(summary.returnedAt).not.toBeNull();

    const mail = await waitForMail(state.app, state.tokens.admin, (m: MailMessageDto) =>
      m.subject.startsWith('Returned with comments: Returned with three'),
    );
    expect(mail.text).toContain('Open comments (3):');
    expect(mail.text).toContain('- Please look at the two storey comments.');
    expect(mail.text).toContain('- On storey 1: Check storey 1 stiffness.');
    expect(mail.text).toContain('- On storey 3: Roof mass seems low.');
    expect(mail.text).toMatch(
      new RegExp(`Open the calc: http://[^\\s]+/calculations/${calc.id}\\?tab=review`),
    );
    expect(mail.text).toContain('the locally adopted building code governs');
  });

  it('lists each message once in the outbox, and every message ends with the caution', async () => {
    await calcInState(signedIn, 'submitted', 'Outbox once');
    await waitForMail(state.app, state.tokens.admin, (m) =>
      m.subject.startsWith('Submitted for review: Outbox once'),
    );
    const outbox = await get<MailMessageDto[]>('/api/mail/outbox', 'admin');
    const ours = outbox.filter((m) => m.subject.startsWith('Submitted for review: Outbox once'));
    expect(ours).toHaveLength(1);
    expect(ours[0].status).toBe('sent');
    for (const message of outbox) expect(message.text).toContain('the engineer of record decides');
  });
});
