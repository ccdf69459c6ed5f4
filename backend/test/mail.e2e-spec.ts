import { sampleInputs as inputs, useSignedInApp, waitForMail } from './support/fixtures';

describe('Mail through the local catcher', () => {
  const { state, http, as } = useSignedInApp();

  const received = (subjectStart: string) =>
    waitForMail(state.app, state.tokens.admin, (m) => m.subject.startsWith(subjectStart));

  it('tells reviewers of a submission and the author of a return and a lock, over SMTP', async () => {
    const projectId = (
      await http().post('/api/projects').set(as('designer')).send({ name: 'Mail project' })
    ).body.id;
    const calc = (
      await http()
        .post(`/api/projects/${projectId}/calculations`)
        .set(as('designer'))
        .send({ title: 'Mailed calc', inputs: inputs() })
    ).body;
    await http().post(`/api/calculations/${calc.id}/analyse`).set(as('designer')).expect(200);
    await http().post(`/api/calculations/${calc.id}/submit`).set(as('designer')).expect(200);
    const submitted = await received('Submitted for review: Mailed calc');
    expect(submitted.to).toBe('reviewer@tiermode.test');

    await http()
      .post(`/api/calculations/${calc.id}/return`)
      .set(as('reviewer'))
      .send({ comment: 'Use the cracked stiffness.' })
      .expect(200);
    const returned = await received('Returned with comments: Mailed calc');
    expect(returned.to).toBe('designer@tiermode.test');
    expect(returned.text).toContain('Use the cracked stiffness.');

    await http().post(`/api/calculations/${calc.id}/analyse`).set(as('designer')).expect(200);
    await http().post(`/api/calculations/${calc.id}/submit`).set(as('designer')).expect(200);
    const locked = await http()
      .post(`/api/calculations/${calc.id}/lock`)
      .set(as('reviewer'))
      .send({ statement: 'Accepted.' })
      .expect(200);
    const lockMail = await received('Locked as the calc of record: Mailed calc');
    expect(lockMail.to).toBe('designer@tiermode.test');
    expect(lockMail.text).toContain(locked.body.seal.hash);
  });

  it('shows the outbox to admins only', async () => {
    for (const role of ['designer', 'reviewer', 'student'] as const) {
      await http().get('/api/mail/outbox').set(as(role)).expect(403);
    }
  });
});
