import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import type { App } from 'supertest/types';
import { ConfigService } from '@nestjs/config';
import { sampleInputs } from './support/fixtures';
import { createTestApp, tokenFor } from './support/test-app';

/** Each person's costly requests are limited a minute; the limit is 4 here (120 by default). */
describe('The per-person limit on costly routes', () => {
  let app: INestApplication<App>;
  let designer: string;
  let student: string;

  beforeAll(async () => {
    app = await createTestApp();
    // As RATE_LIMIT_PER_MINUTE=4 would set it (setup-env.ts sets it high for the other suites).
    app.get(ConfigService).set('expensiveRequestsPerMinute', 4);
    designer = await tokenFor(app, 'designer');
    student = await tokenFor(app, 'student');
  });
  afterAll(() => app.close());

  const analyse = (token: string) =>
    request(app.getHttpServer())
      .post('/api/analysis')
      .set('Authorization', `Bearer ${token}`)
      .send(sampleInputs());

  it('answers 429 with Retry-After past the limit, counting every costly route together', async () => {
    await analyse(designer).expect(200);
    await analyse(designer).expect(200);
    await request(app.getHttpServer())
      .post('/api/spectra/generate')
      .set('Authorization', `Bearer ${designer}`)
      .send({ kind: 'asce7-two-period', sds: 1, sd1: 0.6, tl: 8 })
      .expect(200);
    await request(app.getHttpServer())
      .post('/api/checks')
      .set('Authorization', `Bearer ${designer}`)
      .send({
        ...sampleInputs(),
        basis: {
          code: 'USER',
          scaleFactor: 1,
          driftLimitRatio: 0.02,
          deflectionAmplification: 1,
          stabilityLimit: 0.1,
        },
      })
      .expect(200);
    const refused = await analyse(designer).expect(429);
    expect(Number(refused.headers['retry-after'])).toBeGreaterThanOrEqual(1);
    expect(Number(refused.headers['retry-after'])).toBeLessThanOrEqual(60);
    expect(refused.body).toEqual({
      statusCode: 429,
      message: [
        expect.stringMatching(
          /^Too many analyses, checks, spectra, imports or calc packages: at most 4 a minute for each person\. Wait \d+ s and try again$/,
        ),
      ],
      error: 'Too Many Requests',
    });
    const pdf = await request(app.getHttpServer())
      .post('/api/imports/spectrum')
      .set('Authorization', `Bearer ${designer}`)
      .attach('file', Buffer.from('Period (s),Sa (g)\n0,0.4\n1,1'), 'spectrum.csv');
    expect(pdf.status).toBe(429);
  });

  it('leaves other people and the cheap routes alone', async () => {
    await analyse(student).expect(200);
    await request(app.getHttpServer())
      .get('/api/projects')
      .set('Authorization', `Bearer ${designer}`)
      .expect(200);
  });
});
