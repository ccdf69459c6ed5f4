import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import type { App } from 'supertest/types';
import { sampleInputs } from './support/fixtures';
import { createTestApp, tokenFor } from './support/test-app';

describe('Text with control characters', () => {
  let app: INestApplication<App>;
  let token: string;
  beforeAll(async () => {
    app = await createTestApp();
    token = await tokenFor(app, 'designer');
  });
  afterAll(() => app.close());

  it.each([
    [
      'a project name',
      '/api/projects',
      { name: 'Block\u0000A' },
      'name must not contain control characters (found U+0000)',
    ],
    [
      'a storey label',
      '/api/analysis',
      {
        ...sampleInputs(),
        storeys: [{ ...sampleInputs().storeys[0], label: 'Ground\u001b[31m' }],
      },
      'storeys[0].label (storey 1) must not contain control characters (found U+001B)',
    ],
  ])('refuses %s holding one, naming the field', async (_, path, body, message) => {
    const res = await request(app.getHttpServer())
      .post(path)
      .set('Authorization', `Bearer ${token}`)
      .send(body)
      .expect(400);
    expect(res.body.message).toContain(message);
  });

  it('keeps what was saved when a change with a NUL is refused, and keeps tabs and new lines', async () => {
    const created = await request(app.getHttpServer())
      .post('/api/projects')
      .set('Authorization', `Bearer ${token}`)
      .send({ name: 'Ridge Street\tblock', site: 'Plot 4\nnorth side' })
      .expect(201);
    expect(created.body.site).toBe('Plot 4\nnorth side');
    const calc = await request(app.getHttpServer())
      .post(`/api/projects/${created.body.id}/calculations`)
      .set('Authorization', `Bearer ${token}`)
      .send({ title: 'Frame A', inputs: sampleInputs() })
      .expect(201);
    const refused = await request(app.getHttpServer())
      .patch(`/api/calculations/${calc.body.id}`)
      .set('Authorization', `Bearer ${token}`)
      .send({ version: calc.body.version, title: 'Frame\u0000B' })
      .expect(400);
    expect(refused.body.message).toEqual([
      'title must not contain control characters (found U+0000)',
    ]);
    const kept = await request(app.getHttpServer())
      .get(`/api/calculations/${calc.body.id}`)
      .set('Authorization', `Bearer ${token}`)
      .expect(200);
    expect(kept.body.title).toBe('Frame A');
    expect(kept.body.version).toBe(calc.body.version);
  });
});

describe('Deleting a project that holds calcs', () => {
  it('answers 409 saying why, and deletes an empty project', async () => {
    const app = await createTestApp();
    const token = await tokenFor(app, 'designer');
    const auth = { Authorization: `Bearer ${token}` };
    const project = await request(app.getHttpServer())
      .post('/api/projects')
      .set(auth)
      .send({ name: 'Kept' })
      .expect(201);
    await request(app.getHttpServer())
      .post(`/api/projects/${project.body.id}/calculations`)
      .set(auth)
      .send({ title: 'Frame A', inputs: sampleInputs() })
      .expect(201);
    const refused = await request(app.getHttpServer())
      .delete(`/api/projects/${project.body.id}`)
      .set(auth)
      .expect(409);
    expect(refused.body.message).toEqual([
      'This project holds 1 calculation, so it cannot be deleted; calcs are kept for the record',
    ]);
    await request(app.getHttpServer())
      .get(`/api/projects/${project.body.id}`)
      .set(auth)
      .expect(200);
    const empty = await request(app.getHttpServer())
      .post('/api/projects')
      .set(auth)
      .send({ name: 'Empty' })
      .expect(201);
    await request(app.getHttpServer())
      .delete(`/api/projects/${empty.body.id}`)
      .set(auth)
      .expect(204);
    await app.close();
  });
});
