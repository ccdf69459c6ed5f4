import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { MikroORM } from '@mikro-orm/knex';
import type { SqlOrm } from '../src/database/sql-orm';
import { prepareDatabase } from '../src/database/prepare-database';
import { createOrmConfig } from '../src/mikro-orm.config';
import { AuditEvent } from '../src/audit/audit-event.entity';
import { firstBrokenEvent } from '../src/audit/audit-hash';
import { Calculation } from '../src/calculations/calculation.entity';
import { sealedContentOf } from '../src/calculations/lock';
import { sealHash } from '../src/calculations/seal';
import { User } from '../src/users/user.entity';
import { AuditHead } from '../src/audit/audit-head';
import { loadEnvironment } from '../src/config/environment';
import { SigningKey } from '../src/signing/signing-key';

const signings = new WeakMap<SqlOrm, { key: SigningKey; head: AuditHead }>();

/** A fresh database, with a seal key and chain head of its own beside it. */
async function freshOrm(): Promise<SqlOrm> {
  const dir = mkdtempSync(join(tmpdir(), 'tiermode-seed-'));
  const env = loadEnvironment({
    DATABASE_PATH: join(dir, 'db.sqlite'),
    JWT_SECRET: 'x'.repeat(32),
  });
  const orm = await MikroORM.init(createOrmConfig(env.databasePath));
  const key = new SigningKey(env.sealPrivateKeyPem);
  signings.set(orm, { key, head: new AuditHead(env.auditHeadPath, key) });
  return orm;
}

const signingOf = (orm: SqlOrm) => signings.get(orm)!;

describe('Migrations and seeding', () => {
  it('migrates an empty database, seeds the four demo accounts once, and is safe to rerun', async () => {
    const orm = await freshOrm();
    try {
      const first = await prepareDatabase(orm, { demoMode: true }, signingOf(orm));
      expect(first.applied.length).toBeGreaterThan(0);
      expect(first.seed).toBe('demo-accounts-created');
      const again = await prepareDatabase(orm, { demoMode: true }, signingOf(orm));
      expect(again).toEqual({ applied: [], seed: 'nothing-to-do' });
      const users = await orm.em.fork().find(User, {}, { orderBy: { email: 'asc' } });
      expect(users.map((u) => [u.email, u.role])).toEqual([
        ['admin@tiermode.test', 'admin'],
        ['designer@tiermode.test', 'designer'],
        ['reviewer@tiermode.test', 'reviewer'],
        ['student@tiermode.test', 'student'],
      ]);
    } finally {
      await orm.close();
    }
  });

  it('seeds the demo buildings: one calc locked with a valid seal, one submitted, one draft, all on the audit trail', async () => {
    const orm = await freshOrm();
    try {
      await prepareDatabase(orm, { demoMode: true }, signingOf(orm));
      const em = orm.em.fork();
      const calcs = await em.find(
        Calculation,
        {},
        { populate: ['project'], orderBy: { project: { name: 'asc' }, title: 'asc' } },
      );
      expect(calcs.map((c) => [c.project.name, c.status, c.inputs.storeys.length])).toEqual([
        ['Alder Court housing block', 'locked', 7],
        ['Quarry Lane laboratory', 'submitted', 12],
        ['Quarry Lane laboratory', 'draft', 12],
      ]);
      const locked = calcs[0];
      const content = locked.seal && sealedContentOf(locked, locked.seal);
      expect(content && sealHash(content)).toBe(locked.seal?.hash);
      expect(locked.seal?.sealVersion).toBe(2);
      expect(signingOf(orm).key.verify('seal', locked.seal!.hash, locked.seal?.signature)).toBe(
        true,
      );
      expect(locked.analysis?.modes).toHaveLength(7);
      // The calc of record carries a response history under the invented demo record, sealed.
      expect(locked.history?.record.origin).toBe('demo');
      expect(locked.historyResults?.response.peaks.displacement).toHaveLength(7);
      expect(content).toHaveProperty('historyResults', locked.historyResults);
      const events = await em.find(AuditEvent, {}, { orderBy: { seq: 'asc' } });
      expect(events.map((e) => e.action)).toEqual([
        'created',
        'analysed',
        'submitted',
        'locked',
        'created',
        'analysed',
        'submitted',
        'created',
      ]);
      expect(firstBrokenEvent(events)).toBeNull();
      // Running again on the seeded database adds nothing.
      await prepareDatabase(orm, { demoMode: true }, signingOf(orm));
      expect(await orm.em.fork().count(Calculation, {})).toBe(3);
    } finally {
      await orm.close();
    }
  });

  it('sets WAL journaling, full sync, a busy timeout and foreign keys on the connection', async () => {
    const orm = await freshOrm();
    try {
      const pragma = async (name: string) =>
        Object.values((await orm.em.getConnection().execute(`pragma ${name}`))[0])[0];
      expect(await pragma('journal_mode')).toBe('wal');
      expect(await pragma('synchronous')).toBe(2); // 2 = FULL
      expect(await pragma('busy_timeout')).toBe(5000);
      expect(await pragma('foreign_keys')).toBe(1);
    } finally {
      await orm.close();
    }
  });

  it('with DEMO=off creates the first admin from ADMIN_EMAIL and ADMIN_PASSWORD, and no demo accounts', async () => {
    const orm = await freshOrm();
    try {
      await expect(prepareDatabase(orm, { demoMode: false }, signingOf(orm))).rejects.toThrow(
        'DEMO=off on an empty database: set ADMIN_EMAIL and ADMIN_PASSWORD to create the first admin',
      );
      await expect(
        prepareDatabase(
          orm,
          {
            demoMode: false,
            adminEmail: 'it@firm.test',
            adminPassword: 'password123',
          },
          signingOf(orm),
        ),
      ).rejects.toThrow('ADMIN_PASSWORD is one of the most common passwords');
      const result = await prepareDatabase(
        orm,
        {
          demoMode: false,
          adminEmail: 'IT@firm.test',
          adminPassword: 'lintel-corbel-2031',
        },
        signingOf(orm),
      );
      expect(result.seed).toBe('first-admin-created');
      const users = await orm.em.fork().find(User, {});
      expect(users.map((u) => [u.email, u.role])).toEqual([['it@firm.test', 'admin']]);
    } finally {
      await orm.close();
    }
  });

  it('with DEMO=off deactivates demo accounts left by an earlier demo run', async () => {
    const orm = await freshOrm();
    try {
      await prepareDatabase(orm, { demoMode: true }, signingOf(orm));
      await prepareDatabase(orm, { demoMode: false }, signingOf(orm));
      const users = await orm.em.fork().find(User, {});
      expect(users.every((u) => !u.active)).toBe(true);
    } finally {
      await orm.close();
    }
  });
});
