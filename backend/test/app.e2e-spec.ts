import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import type { App } from 'supertest/types';
import { createTestApp, tokenFor } from './support/test-app';

describe('The app shell of the API', () => {
  let app: INestApplication<App>;

  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(() => app.close());

  it('GET /api/health answers {"status":"ok"} once the database is migrated', async () => {
    const res = await request(app.getHttpServer()).get('/api/health').expect(200);
    expect(res.body).toEqual({ status: 'ok' });
  });

  it('sends helmet security headers', async () => {
    const res = await request(app.getHttpServer()).get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['x-powered-by']).toBeUndefined();
  });

  it('answers an unknown API route with a JSON 404', async () => {
    const token = await tokenFor(app, 'designer');
    const res = await request(app.getHttpServer())
      .get('/api/no-such-route')
      .set('Authorization', `Bearer ${token}`)
      .expect(404);
    expect(res.body.statusCode).toBe(404);
    expect(Array.isArray(res.body.message)).toBe(true);
  });

  it('answers malformed JSON with 400, not 500', async () => {
    const res = await request(app.getHttpServer())
      .post('/api/auth/login')
      .set('Content-Type', 'application/json')
      .send('{"email": "admin@tiermode.test", ')
      .expect(400);
    expect(res.body.message[0]).toMatch(/JSON/);
  });
});
