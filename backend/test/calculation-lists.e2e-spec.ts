import {
  CODE_BASES,
  type CalculationSummaryDto,
  type LibraryEntryDto,
} from '@tiermode/shared-types';
import { sampleInputs, useSignedInApp } from './support/fixtures';

const { http, as } = useSignedInApp();

async function newCalc(projectId: string, title: string): Promise<string> {
  const res = await http()
    .post(`/api/projects/${projectId}/calculations`)
    .set(as('designer'))
    .send({ title, inputs: sampleInputs() })
    .expect(201);
  return (res.body as { id: string }).id;
}

describe('project code basis and structural system', () => {
  it('stores them, with USER as the default basis', async () => {
    const plain = await http().post('/api/projects').set(as('designer')).send({ name: 'Plain' });
    expect(plain.body).toMatchObject({ codeBasis: 'USER', structuralSystem: null });
    const full = await http()
      .post('/api/projects')
      .set(as('designer'))
      .send({ name: 'Framed', codeBasis: 'ASCE7-22', structuralSystem: '  Steel braced frames ' })
      .expect(201);
    expect(full.body).toMatchObject({
      codeBasis: 'ASCE7-22',
      structuralSystem: 'Steel braced frames',
    });
    const changed = await http()
      .patch(`/api/projects/${full.body.id}`)
      .set(as('designer'))
      .send({ codeBasis: 'EN1998-1', structuralSystem: null })
      .expect(200);
    expect(changed.body).toMatchObject({ codeBasis: 'EN1998-1', structuralSystem: null });
  });

  it.each([
    [{ name: 'x', codeBasis: 'ASCE 7-16' }, `codeBasis must be one of ${CODE_BASES.join(', ')}`],
    [{ name: 'x', structuralSystem: 'y'.repeat(121) }, 'structuralSystem must be at most 120'],
    [{ name: 'x', structuralSystem: 7 }, 'structuralSystem must be a string'],
  ])('refuses %j with a message naming the field', async (body, message) => {
    const res = await http().post('/api/projects').set(as('designer')).send(body).expect(400);
    expect((res.body as { message: string[] }).message.join(' ')).toContain(message);
  });
});

describe('GET /api/projects/designers', () => {
  it('lists the active designers by name, for adding members', async () => {
    const res = await http().get('/api/projects/designers').set(as('designer')).expect(200);
    expect(res.body).toEqual([{ id: expect.any(String), name: 'Mira Castell' }]);
  });
});

describe('GET /api/calculations', () => {
  let projectId: string;
  let draftId: string;
  let submittedId: string;

  beforeAll(async () => {
    const project = await http()
      .post('/api/projects')
      .set(as('designer'))
      .send({ name: 'Lists project', codeBasis: 'EN1998-1', structuralSystem: 'Timber walls' })
      .expect(201);
    projectId = project.body.id;
    draftId = await newCalc(projectId, 'Draft one');
    submittedId = await newCalc(projectId, 'Submitted one');
    await http().post(`/api/calculations/${submittedId}/analyse`).set(as('designer')).expect(200);
    await http().post(`/api/calculations/${submittedId}/submit`).set(as('designer')).expect(200);
  });

  const ids = (body: CalculationSummaryDto[]) => body.map((c) => c.id);

  it('lists summaries the caller may read, filtered by status, author and project', async () => {
    const mine = await http()
      .get(`/api/calculations?status=draft&author=me&projectId=${projectId}`)
      .set(as('designer'))
      .expect(200);
    expect(ids(mine.body)).toEqual([draftId]);
    expect(mine.body[0]).toMatchObject({
      title: 'Draft one',
      projectName: 'Lists project',
      status: 'draft',
      storeyCount: 3,
      analysisStale: true,
      author: { name: 'Mira Castell' },
    });
    expect(mine.body[0]).not.toHaveProperty('inputs');

    const waiting = await http()
      .get('/api/calculations?status=submitted&notAuthor=me')
      .set(as('reviewer'))
      .expect(200);
    expect(ids(waiting.body)).toContain(submittedId);
    expect(ids(waiting.body)).not.toContain(draftId);

    const forProject = await http()
      .get(`/api/calculations?projectId=${projectId}`)
      .set(as('reviewer'))
      .expect(200);
    expect(ids(forProject.body).sort()).toEqual([draftId, submittedId].sort());
  });

  it('gives a student only calcs of record, whatever the query asks', async () => {
    const res = await http()
      .get('/api/calculations?status=draft,submitted,locked')
      .set(as('student'))
      .expect(200);
    expect(res.body.length).toBeGreaterThan(0); // the demo's locked calc
    expect(
      (res.body as CalculationSummaryDto[]).every((c) =>
        ['locked', 'superseded'].includes(c.status),
      ),
    ).toBe(true);
    expect(ids(res.body)).not.toContain(draftId);
  });

  it.each([
    [
      'status=drafted',
      'status must be a comma-separated list of draft, submitted, locked, superseded',
    ],
    ['author=someone', 'author must be "me"'],
    ['projectId=12', 'projectId must be a project id (UUID)'],
    ['limit=0', 'limit must be a whole number from 1 to 200'],
    ['limit=abc', 'limit must be a whole number from 1 to 200'],
    ['order=title', 'property order should not exist'],
  ])('refuses ?%s with a message naming the parameter', async (query, message) => {
    const res = await http().get(`/api/calculations?${query}`).set(as('designer')).expect(400);
    expect((res.body as { message: string[] }).message.join(' ')).toContain(message);
  });

  it('honours the limit', async () => {
    const res = await http().get('/api/calculations?limit=1').set(as('designer')).expect(200);
    expect(res.body).toHaveLength(1);
  });
});

describe('GET /api/library entries', () => {
  it('carry the project code basis and structural system for the filters', async () => {
    const res = await http().get('/api/library').set(as('student')).expect(200);
    const alder = (res.body as LibraryEntryDto[]).find((e) =>
      e.projectName.startsWith('Alder Court'),
    );
    expect(alder).toMatchObject({
      codeBasis: 'EN1998-1',
      structuralSystem: 'Reinforced concrete walls',
      storeyCount: 7,
    });
  });
});
