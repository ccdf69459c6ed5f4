import { request as httpRequest } from 'node:http';
import type { AddressInfo, Server } from 'node:net';
import type { INestApplication } from '@nestjs/common';
import type { App } from 'supertest/types';
import { DEMO_PASSWORD } from '../src/database/demo-accounts';
import { LOGIN_FAILURE_LIMIT, LoginThrottleService } from '../src/auth/login-throttle.service';
import { createTestApp } from './support/test-app';

/**
 * Failed sign-ins are counted per account and address (10 a minute), and per address over all
 * accounts (100 a minute). Requests come from two loopback addresses, as from two offices.
 */
describe('Throttling of failed sign-ins', () => {
  let app: INestApplication<App>;
  let port: number;

  beforeAll(async () => {
    app = await createTestApp();
    await app.listen(0, '127.0.0.1');
    port = ((app.getHttpServer() as unknown as Server).address() as AddressInfo).port;
  });
  afterAll(() => app.close());

  /** POST /api/auth/login from `from` (a loopback address of this machine). */
  const attempt = (email: string, password: string, from = '127.0.0.1') =>
    new Promise<{ status: number; body: { message: string[] } }>((resolve, reject) => {
      const body = JSON.stringify({ email, password });
      const req = httpRequest(
        {
          host: '127.0.0.1',
          port,
          localAddress: from,
          method: 'POST',
          path: '/api/auth/login',
          headers: {
            'Content-Type': 'application/json',
            'Content-Length': Buffer.byteLength(body),
          },
        },
        (res) => {
          let text = '';
          res.on('data', (chunk: Buffer) => (text += chunk.toString()));
          res.on('end', () => resolve({ status: res.statusCode ?? 0, body: JSON.parse(text) }));
        },
      );
      req.on('error', reject);
      req.end(body);
    });

  it('answers the 11th failure in a minute with 429, and then refuses even the right password', async () => {
    // Successful sign-ins are not failures and do not count.
    for (let i = 0; i < 3; i += 1) {
      expect((await attempt('designer@tiermode.test', DEMO_PASSWORD)).status).toBe(200);
    }
    for (let i = 1; i <= LOGIN_FAILURE_LIMIT; i += 1) {
      expect((await attempt('designer@tiermode.test', `wrong-password-${i}`)).status).toBe(401);
    }
    const eleventh = await attempt('designer@tiermode.test', 'wrong-password-11');
    expect(eleventh.status).toBe(429);
    expect(eleventh.body.message[0]).toMatch(/Too many failed sign-ins/);
    expect((await attempt('designer@tiermode.test', DEMO_PASSWORD)).status).toBe(429);
  });

  it('leaves colleagues behind the same address, and the same account elsewhere, alone', async () => {
    // The designer is blocked from 127.0.0.1 (the test before); the reviewer there is not...
    expect((await attempt('reviewer@tiermode.test', DEMO_PASSWORD)).status).toBe(200);
    // ...nor is the designer from another address.
    expect((await attempt('designer@tiermode.test', DEMO_PASSWORD, '127.0.0.2')).status).toBe(200);
  });

  it('blocks an address that tries many accounts, past its own limit a minute', async () => {
    // 100 by default; 20 here, since every failure costs a password hash.
    app.get(LoginThrottleService).limits.address = 20;
    const from = '127.0.0.3';
    let statuses: number[] = [];
    for (let i = 0; i < 20; i += 1) {
      statuses.push((await attempt(`sprayed-${i}@tiermode.test`, 'wrong-password', from)).status);
    }
    expect(statuses).toEqual(Array(20).fill(401));
    statuses = [(await attempt('another@tiermode.test', 'wrong-password', from)).status];
    expect(statuses).toEqual([429]);
    expect((await attempt('student@tiermode.test', DEMO_PASSWORD, from)).status).toBe(429);
  });
});
