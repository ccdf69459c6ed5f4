import type { UserDto } from '@tiermode/shared-types';
import { sampleInputs, useSignedInApp } from './support/fixtures';

/**
 * Requests of one person at the same moment must not trip over each other. (MikroORM 6 on SQLite
 * saw unchanged `type: 'datetime'` columns as changed, so every write also rewrote the signed-in
 * user's row and bumped its version: two saves at once gave a spurious 409.)
 */
const { http, as } = useSignedInApp();

const designerVersion = async () => {
  const users = (await http().get('/api/users').set(as('admin')).expect(200)).body as UserDto[];
  return users.find((u) => u.email === 'designer@tiermode.test')!.version;
};

describe('One person saving several things at once', () => {
  it('creates eight projects at once without a conflict', async () => {
    const results = await Promise.all(
      Array.from({ length: 8 }, (_, i) =>
        http()
          .post('/api/projects')
          .set(as('designer'))
          .send({ name: `Parallel ${i}` }),
      ),
    );
    expect(results.map((r) => r.status)).toEqual(Array(8).fill(201));
  });

  it('edits four calcs at once without a conflict', async () => {
    const project = await http()
      .post('/api/projects')
      .set(as('designer'))
      .send({ name: 'Four calcs' })
      .expect(201);
    const calcs = await Promise.all(
      [1, 2, 3, 4].map(async (i) => {
        const res = await http()
          .post(`/api/projects/${project.body.id}/calculations`)
          .set(as('designer'))
          .send({ title: `Calc ${i}`, inputs: sampleInputs() })
          .expect(201);
        return res.body as { id: string; version: number };
      }),
    );
    const edits = await Promise.all(
      calcs.map((c, i) =>
        http()
          .patch(`/api/calculations/${c.id}`)
          .set(as('designer'))
          .send({ version: c.version, title: `Calc ${i + 1}, edited` }),
      ),
    );
    expect(edits.map((r) => r.status)).toEqual([200, 200, 200, 200]);
  });

  it('leaves the person’s own record (and its version) alone when they save other things', async () => {
    const before = await designerVersion();
    await http()
      .post('/api/projects')
      .set(as('designer'))
      .send({ name: 'Untouched user' })
      .expect(201);
    await http().post('/api/analysis').set(as('designer')).send(sampleInputs()).expect(200);
    expect(await designerVersion()).toBe(before);
  });
});
