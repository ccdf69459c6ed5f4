import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DEMO_PASSWORD } from '../src/database/demo-accounts';
import { createTestApp } from './support/test-app';

describe('Throttling of failed sign-ins', () => {
  let app: INestApplication<App>;

  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(() => app.close());

  it('answers the 11th failure in a minute with 429, and then refuses even the right password', async () => {
    const attempt = (password: string) =>
      request(app.getHttpServer())
        .post('/api/auth/login')
        .send({ email: 'designer@tiermode.test', password });

    // Successful sign-ins are not failures and do not count.
    for (let i = 0; i < 3; i += 1) await attempt(DEMO_PASSWORD).expect(200);
    for (let i = 1; i <= 10; i += 1) await attempt(`wrong-password-${i}`).expect(401);
    const eleventh = await attempt('wrong-password-11').expect(429);
    expect(eleventh.body.message[0]).toMatch(/Too many failed sign-ins/);
    await attempt(DEMO_PASSWORD).expect(429);
  });
});
