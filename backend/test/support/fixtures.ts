import type { INestApplication } from '@nestjs/common';
import type { CalculationDto, CalculationInputs, MailMessageDto } from '@tiermode/shared-types';
import request from 'supertest';
import type { App } from 'supertest/types';
import { MikroORM } from '@mikro-orm/knex';
import { MailMessage } from '../../src/mail/mail-message.entity';
import { MailService } from '../../src/mail/mail.service';
import { createTestApp, tokenFor, type DemoRole } from './test-app';

/** A small invented three-storey building with a simple spectrum, for workflow tests. */
export function sampleInputs(): CalculationInputs {
  return {
    storeys: [
      { mass: 300000, stiffness: 4e8, height: 4 },
      { mass: 280000, stiffness: 3.6e8, height: 3.5 },
      { mass: 220000, stiffness: 3e8, height: 3.5 },
    ],
    spectrum: {
      points: [
        { period: 0, sa: 0.4 },
        { period: 0.5, sa: 1 },
        { period: 4, sa: 0.2 },
      ],
    },
    dampingRatio: 0.05,
  };
}

/**
 * Code bases for the invented three-storey building (invented values, within the ranges the
 * standards allow): ASCE 7-22 with a steel moment frame's R, Cd, Ct and x, and EN 1998-1 on
 * ground type C.
 */
export const ASCE_BASIS = {
  code: 'ASCE7-22',
  sds: 1.0,
  sd1: 0.6,
  s1: 0.6,
  tl: 8,
  r: 8,
  cd: 5.5,
  ie: 1.0,
  ct: 0.0466,
  x: 0.9,
  riskCategory: 'II',
};
export const EN_BASIS = {
  code: 'EN1998-1',
  ag: 0.25,
  groundType: 'C',
  spectrumType: 1,
  importanceFactor: 1,
  q: 3.9,
  nu: 0.5,
  driftLimitClass: 'ductile',
};

/** The smallest PDF an attachment may be: a catalog and one blank page (ISO 32000-1 7.7). */
export const ONE_PAGE_PDF = Buffer.from(
  '%PDF-1.4\n1 0 obj<</Type/Catalog/Pages 2 0 R>>endobj\n2 0 obj<</Type/Pages/Kids[3 0 R]/Count 1>>endobj\n' +
    '3 0 obj<</Type/Page/Parent 2 0 R/MediaBox[0 0 595 842]>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n',
  'latin1',
);

/** A supertest parser that keeps a binary body (an XLSX or a PDF) as one Buffer. */
export const binaryBody: Parameters<request.Test['parse']>[0] = (res, done) => {
  const chunks: Buffer[] = [];
  res.on('data', (chunk: Buffer) => chunks.push(chunk));
  res.on('end', () => done(null, Buffer.concat(chunks)));
};

/**
 * Waits (up to 5 s) for a mail the local catcher received that `match` picks out, and returns it
 * as its recipient got it: the outbox masks set-password links, the stored mail does not.
 */
export async function waitForMail(
  app: INestApplication<App>,
  _adminToken: string,
  match: (mail: MailMessageDto) => boolean,
): Promise<MailMessageDto> {
  for (let i = 0; i < 50; i += 1) {
    await app.get(MailService).settled();
    // The catcher's copies are kept apart from the outbox (which lists each message once).
    const caught = await app
      .get(MikroORM)
      .em.fork()
      .find(MailMessage, { status: 'received' }, { orderBy: { createdAt: 'desc' } });
    const found = caught
      .map((m) => ({
        id: m.id,
        status: m.status,
        from: m.from,
        to: m.to,
        subject: m.subject,
        text: m.text,
        attempts: m.attempts,
        lastError: m.lastError,
        createdAt: m.createdAt.toISOString(),
      }))
      .find(match);
    if (found) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error('The expected mail did not reach the catcher');
}

/**
 * For a describe block: the app on its own fresh database, started before the block's tests and
 * closed after, with a token for each demo role and request helpers.
 */
export function useSignedInApp() {
  const state = {} as { app: INestApplication<App>; tokens: Record<DemoRole, string> };
  beforeAll(async () => {
    state.app = await createTestApp();
    state.tokens = {} as Record<DemoRole, string>;
    for (const role of ['admin', 'designer', 'reviewer', 'student'] as const) {
      state.tokens[role] = await tokenFor(state.app, role);
    }
  });
  afterAll(() => state.app.close());
  return {
    state,
    http: () => request(state.app.getHttpServer()),
    as: (role: DemoRole) => ({ Authorization: `Bearer ${state.tokens[role]}` }),
  };
}

/**
 * A calc of the invented three-storey building in a project of its own, brought by the demo
 * designer (and, for `locked`, the demo reviewer) to `status` through the API.
 */
export async function calcInState(
  signedIn: Pick<ReturnType<typeof useSignedInApp>, 'http' | 'as'>,
  status: 'draft' | 'submitted' | 'locked',
  title: string,
): Promise<CalculationDto> {
  const { http, as } = signedIn;
  const project = await http().post('/api/projects').set(as('designer')).send({ name: title });
  let calc = (
    await http()
      .post(`/api/projects/${(project.body as { id: string }).id}/calculations`)
      .set(as('designer'))
      .send({ title, inputs: sampleInputs() })
      .expect(201)
  ).body as CalculationDto;
  if (status === 'draft') return calc;
  await http().post(`/api/calculations/${calc.id}/analyse`).set(as('designer')).expect(200);
  calc = (await http().post(`/api/calculations/${calc.id}/submit`).set(as('designer')).expect(200))
    .body as CalculationDto;
  if (status === 'submitted') return calc;
  return (
    await http()
      .post(`/api/calculations/${calc.id}/lock`)
      .set(as('reviewer'))
      .send({ statement: 'Checked independently.' })
      .expect(200)
  ).body as CalculationDto;
}
