import './support/failing-smtp';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import type { App } from 'supertest/types';
import { createTestApp, tokenFor } from './support/test-app';

type Mail = { status: string; subject: string; attempts: number; lastError: string | null };

describe('A failing SMTP server', () => {
  let app: INestApplication<App>;
  let designer: string;
  let admin: string;

  beforeAll(async () => {
    app = await createTestApp();
    designer = await tokenFor(app, 'designer');
    admin = await tokenFor(app, 'admin');
  });
  afterAll(() => app.close());

  it('does not fail the action, and the message waits in the outbox with its error', async () => {
    const http = () => request(app.getHttpServer());
    const auth = { Authorization: `Bearer ${designer}` };
    const projectId = (await http().post('/api/projects').set(auth).send({ name: 'No mail' })).body
      .id;
    const calc = (
      await http()
        .post(`/api/projects/${projectId}/calculations`)
        .set(auth)
        .send({
          title: 'Unmailed',
          inputs: {
            storeys: [{ mass: 1e5, stiffness: 1e8, height: 3 }],
            spectrum: {
              points: [
                { period: 0, sa: 1 },
                { period: 2, sa: 1 },
              ],
            },
            dampingRatio: 0.05,
          },
        })
    ).body;
    await http().post(`/api/calculations/${calc.id}/analyse`).set(auth).expect(200);
    const submitted = await http()
      .post(`/api/calculations/${calc.id}/submit`)
      .set(auth)
      .expect(200);
    expect(submitted.body.status).toBe('submitted');

    let mail: Mail | undefined;
    for (let i = 0; i < 100 && !mail?.lastError; i += 1) {
      await new Promise((r) => setTimeout(r, 100));
      const outbox = (
        await http()
          .get('/api/mail/outbox')
          .set({ Authorization: `Bearer ${admin}` })
      ).body as Mail[];
      mail = outbox.find((m) => m.subject.startsWith('Submitted for review: Unmailed'));
    }
    expect(mail).toMatchObject({ status: 'queued', attempts: 1 });
    expect(mail?.lastError).toBeTruthy();
    const stored = await http().get(`/api/calculations/${calc.id}`).set(auth).expect(200);
    expect(stored.body.status).toBe('submitted');
  });
});
