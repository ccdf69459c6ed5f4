import type { INestApplication } from '@nestjs/common';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { Test } from '@nestjs/testing';
import request from 'supertest';
import type { App } from 'supertest/types';
import { AppModule } from '../../src/app.module';
import { configureApp } from '../../src/app.setup';
import { DEMO_PASSWORD } from '../../src/database/demo-accounts';

/** The whole app, configured as main.ts configures it, on this test file's fresh database. */
export async function createTestApp(): Promise<INestApplication<App>> {
  const moduleRef = await Test.createTestingModule({ imports: [AppModule] }).compile();
  const app = configureApp(
    moduleRef.createNestApplication<NestExpressApplication>({ logger: ['error'] }),
  );
  await app.init();
  return app;
}

export type DemoRole = 'admin' | 'designer' | 'reviewer' | 'student';

/** Signs in as a demo account and returns its bearer token. */
export async function tokenFor(app: INestApplication<App>, role: DemoRole): Promise<string> {
  return signIn(app, `${role}@tiermode.test`, DEMO_PASSWORD);
}

export async function signIn(
  app: INestApplication<App>,
  email: string,
  password: string,
): Promise<string> {
  const res = await request(app.getHttpServer())
    .post('/api/auth/login')
    .send({ email, password })
    .expect(200);
  return (res.body as { accessToken: string }).accessToken;
}

/** Every key anywhere in a JSON value, for checks such as "no password field anywhere". */
export function allKeys(value: unknown): string[] {
  if (Array.isArray(value)) return value.flatMap(allKeys);
  if (value && typeof value === 'object') {
    return Object.entries(value).flatMap(([k, v]) => [k, ...allKeys(v)]);
  }
  return [];
}
