import Ajv, { type ValidateFunction } from 'ajv';
import type { OpenAPIObject } from '@nestjs/swagger';
import contract from '@tiermode/shared-types/contract.schema.json';
import type { ContractTypes } from '../src/openapi/contract';
import { sampleInputs, useSignedInApp } from './support/fixtures';
import { routesOf } from './support/routes';

/**
 * The OpenAPI document at /api/docs: every route is in it, every type it names is the
 * shared-types contract, and what the server really sends and accepts fits it.
 */
const { state, http, as } = useSignedInApp();
let doc: OpenAPIObject;
const METHODS = ['get', 'post', 'patch', 'put', 'delete'] as const;
const PUBLIC = [
  'POST /api/auth/login',
  'POST /api/auth/set-password',
  'GET /api/health',
  'GET /api/seal/public-key',
];

/** Every operation as "METHOD /path" (Express's :id style) with its object. */
function operations(): [string, Record<string, unknown>][] {
  return Object.entries(doc.paths).flatMap(([path, item]) =>
    METHODS.filter((m) => (item as Record<string, unknown>)[m]).map(
      (m) =>
        [
          `${m.toUpperCase()} ${path.replace(/\{(\w+)\}/g, ':$1')}`,
          (item as Record<string, Record<string, unknown>>)[m],
        ] as [string, Record<string, unknown>],
    ),
  );
}

/** A validator for a contract type, resolving references inside the served document. */
function validatorFor(name: keyof ContractTypes | 'ApiErrorBody'): ValidateFunction {
  const ajv = new Ajv({ strict: false, validateFormats: false, allErrors: true });
  ajv.addSchema({ $id: 'doc', components: doc.components }, 'doc');
  return ajv.getSchema(`doc#/components/schemas/${name}`)!;
}

function expectFits(name: keyof ContractTypes | 'ApiErrorBody', body: unknown): void {
  const validate = validatorFor(name);
  expect({ valid: validate(body), errors: validate.errors ?? null }).toEqual({
    valid: true,
    errors: null,
  });
}

beforeAll(async () => {
  const res = await http().get('/api/docs/openapi.json').expect(200);
  doc = res.body as OpenAPIObject;
});

describe('The OpenAPI document', () => {
  it('is served as a page at /api/docs and as JSON, without signing in', async () => {
    const page = await http().get('/api/docs').redirects(1).expect(200);
    expect(page.text).toContain('swagger-ui-bundle.js');
    expect(page.text).not.toMatch(/https?:\/\/(?!localhost)[^"']*\.(js|css)/);
    expect(doc.openapi).toBe('3.1.0');
    expect(doc.info.title).toBe('Tiermode API');
    expect(doc.info.description).toContain('the engineer of record govern');
  });

  it('documents every route the server registers, and nothing else', () => {
    const documented = operations().map(([route]) => route);
    expect(new Set(documented)).toEqual(routesOf(state.app));
  });

  it('gives every operation a summary, its success answer and the error body', () => {
    for (const [route, op] of operations()) {
      const responses = op.responses as Record<string, Record<string, unknown>>;
      expect({ route, summary: typeof op.summary }).toEqual({ route, summary: 'string' });
      const success = Object.keys(responses).filter((s) => /^2\d\d$/.test(s));
      expect({ route, success: success.length }).toEqual({ route, success: 1 });
      expect({ route, error: JSON.stringify(responses['4XX']) }).toEqual({
        route,
        error: expect.stringContaining('#/components/schemas/ApiErrorBody'),
      });
    }
  });

  it('asks for the bearer token on every route but the public ones', () => {
    expect(doc.security).toEqual([{ bearer: [] }]);
    expect(doc.components?.securitySchemes?.bearer).toMatchObject({
      type: 'http',
      scheme: 'bearer',
    });
    const open = operations()
      .filter(([, op]) => JSON.stringify(op.security) === '[{}]')
      .map(([route]) => route);
    expect(open.sort()).toEqual([...PUBLIC].sort());
  });

  it('publishes every shared-types type, and every reference in it resolves', () => {
    const schemas = doc.components?.schemas ?? {};
    for (const name of Object.keys(contract.definitions)) expect(schemas).toHaveProperty(name);
    const refs = [...JSON.stringify(doc).matchAll(/"\$ref":"#\/components\/schemas\/([^"]+)"/g)];
    expect(refs.length).toBeGreaterThan(50);
    for (const [, name] of refs) expect(schemas).toHaveProperty(name);
  });

  it('names the shared-types request type of each body', () => {
    const bodyOf = (route: string) =>
      JSON.stringify(operations().find(([r]) => r === route)?.[1].requestBody);
    expect(bodyOf('POST /api/analysis')).toContain('#/components/schemas/AnalysisRequest');
    expect(bodyOf('POST /api/checks')).toContain('#/components/schemas/ChecksRequest');
    expect(bodyOf('PATCH /api/calculations/:id')).toContain(
      '#/components/schemas/UpdateCalculationRequest',
    );
    expect(bodyOf('POST /api/calculations/:id/attachments')).toContain('multipart/form-data');
  });

  it('lists the query parameters of the calc list from the contract type', () => {
    const list = operations().find(([r]) => r === 'GET /api/calculations')![1];
    const names = (list.parameters as { name: string; in: string }[])
      .filter((p) => p.in === 'query')
      .map((p) => p.name);
    expect(names.sort()).toEqual(
      Object.keys(contract.definitions.CalculationListQuery.properties).sort(),
    );
  });

  it('describes what the server really answers (checked with a JSON Schema validator)', async () => {
    const login = await http()
      .post('/api/auth/login')
      .send({ email: 'designer@tiermode.test', password: 'tiermode-demo' })
      .expect(200);
    expectFits('LoginResponse', login.body);
    expectFits('AnalysisRequest', sampleInputs());
    const analysis = await http()
      .post('/api/analysis')
      .set(as('designer'))
      .send(sampleInputs())
      .expect(200);
    expectFits('AnalysisResponse', analysis.body);
    const projects = await http().get('/api/projects').set(as('designer')).expect(200);
    for (const project of projects.body) expectFits('ProjectDto', project);
    const lib = await http().get('/api/library').set(as('student')).expect(200);
    expect(lib.body.length).toBeGreaterThan(0);
    for (const entry of lib.body) expectFits('LibraryEntryDto', entry);
    const calc = await http()
      .get(`/api/calculations/${lib.body[0].id}`)
      .set(as('student'))
      .expect(200);
    expectFits('CalculationDto', calc.body);
    const refused = await http().post('/api/analysis').set(as('designer')).send({}).expect(400);
    expectFits('ApiErrorBody', refused.body);
  });

  it('does not take a wrong body for a right one (the validator is not blind)', () => {
    const validate = validatorFor('AnalysisRequest');
    expect(validate({ ...sampleInputs(), storeys: 'three' })).toBe(false);
    expect(validate({ ...sampleInputs(), extra: 1 })).toBe(false);
  });
});
