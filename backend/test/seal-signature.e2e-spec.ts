import { execFileSync } from 'node:child_process';
import { createPublicKey, verify } from 'node:crypto';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { MikroORM } from '@mikro-orm/knex';
import type {
  AuditVerifyResponse,
  SealCheckResponse,
  SealPublicKeyResponse,
} from '@tiermode/shared-types';
import { Calculation } from '../src/calculations/calculation.entity';
import { sealedContentOf } from '../src/calculations/lock';
import { sealHash } from '../src/calculations/seal';
import { auditHash, type AuditContent } from '../src/audit/audit-hash';
import { calcInState, useSignedInApp } from './support/fixtures';

/**
 * What a database edit can and cannot fake. Someone who can write to the database can change a
 * row and recompute its SHA-256; they cannot sign, since the key lives outside the database.
 * Each case here read "valid" before seals and events were signed.
 */
const { state, http, as } = useSignedInApp();
const sql = (text: string, params: unknown[] = []) =>
  state.app.get(MikroORM).em.getConnection().execute(text, params);

const lockedCalc = (title: string) => calcInState({ http, as }, 'locked', title);

const sealOf = async (id: string) =>
  (await http().get(`/api/calculations/${id}/seal`).set(as('designer')).expect(200))
    .body as SealCheckResponse;
const verifyTrail = async () =>
  (await http().get('/api/audit/verify').set(as('admin')).expect(200)).body as AuditVerifyResponse;

/** What an attacker with the database would do: make the stored hash match the edited row. */
async function rehash(id: string): Promise<void> {
  const em = state.app.get(MikroORM).em.fork();
  const calc = await em.findOneOrFail(
    Calculation,
    { id },
    { populate: ['project', 'author', 'reviewer', 'attachments', 'previousRevision'] },
  );
  const content = sealedContentOf(calc, calc.seal!)!;
  await sql(`update calculations set seal = json_set(seal, '$.hash', ?) where id = ?`, [
    sealHash(content),
    id,
  ]);
}

describe('A signed seal', () => {
  it('reads valid, with hash, signature and lock event each judged', async () => {
    const calc = await lockedCalc('Signed seal');
    const seal = await sealOf(calc.id);
    expect(seal).toMatchObject({
      valid: true,
      hashValid: true,
      signature: 'valid',
      lockEvent: 'valid',
      problems: [],
    });
    expect(seal.seal).toMatchObject({
      sealVersion: 2,
      projectName: 'Signed seal',
      authorName: expect.any(String),
      keyId: expect.stringMatching(/^[0-9a-f]{16}$/),
    });
  });

  it('can be checked outside the product with the published key: node:crypto and openssl', async () => {
    const calc = await lockedCalc('Outside check');
    const key = (await http().get('/api/seal/public-key').expect(200))
      .body as SealPublicKeyResponse;
    expect(key).toMatchObject({ algorithm: 'Ed25519', keyId: calc.seal?.keyId });
    expect(key.messages.seal).toBe('tiermode-seal:<seal hash>');
    const message = Buffer.from(`tiermode-seal:${calc.seal!.hash}`, 'utf8');
    const signature = Buffer.from(calc.seal!.signature!, 'base64');
    expect(verify(null, message, createPublicKey(key.publicKeyPem), signature)).toBe(true);
    // The README's recipe, with the standard tool.
    const dir = mkdtempSync(join(tmpdir(), 'tiermode-seal-'));
    writeFileSync(join(dir, 'public-key.pem'), key.publicKeyPem);
    writeFileSync(join(dir, 'message.txt'), message);
    writeFileSync(join(dir, 'signature.bin'), signature);
    const run = (file: string) =>
      execFileSync(
        'openssl',
        [
          'pkeyutl',
          '-verify',
          '-pubin',
          '-inkey',
          'public-key.pem',
          '-rawin',
          '-in',
          file,
          '-sigfile',
          'signature.bin',
        ],
        { cwd: dir, encoding: 'utf8' },
      );
    expect(run('message.txt')).toMatch(/Signature Verified Successfully/);
    writeFileSync(join(dir, 'other.txt'), `tiermode-seal:${'0'.repeat(64)}`);
    expect(() => run('other.txt')).toThrow();
  });

  it('reads invalid when a row is edited and its hash recomputed: the signature no longer fits', async () => {
    const calc = await lockedCalc('Rehashed');
    await sql(
      `update calculations set inputs = json_set(inputs, '$.dampingRatio', 0.02) where id = ?`,
      [calc.id],
    );
    expect(await sealOf(calc.id)).toMatchObject({ valid: false, hashValid: false });
    await rehash(calc.id);
    const seal = await sealOf(calc.id);
    expect(seal).toMatchObject({ valid: false, hashValid: true, signature: 'invalid' });
    expect(seal.problems).toContain("The seal's signature does not verify with this server's key");
  });

  it.each([
    ['the title', `update calculations set title = 'Another building' where id = ?`],
    ['the revision', `update calculations set revision = 7 where id = ?`],
    ['the status', `update calculations set status = 'draft' where id = ?`],
    [
      'the author',
      `update calculations set author_id = (select id from users where email = 'admin@tiermode.test') where id = ?`,
    ],
    [
      'the reviewer',
      `update calculations set reviewer_id = (select id from users where email = 'admin@tiermode.test') where id = ?`,
    ],
    [
      'the project',
      `update calculations set project_id = (select id from projects where name = 'Rehashed') where id = ?`,
    ],
  ])('covers %s', async (_, statement) => {
    const calc = await lockedCalc(`Identity ${Math.random()}`);
    await sql(statement, [calc.id]);
    const seal = await sealOf(calc.id);
    expect(seal).toMatchObject({ valid: false, hashValid: false, signature: 'valid' });
  });

  it('reads invalid when its seal is stripped of the signature, as if made before signing', async () => {
    const calc = await lockedCalc('Stripped');
    await sql(`update calculations set seal = json_remove(seal, '$.signature') where id = ?`, [
      calc.id,
    ]);
    const seal = await sealOf(calc.id);
    expect(seal).toMatchObject({ valid: false, hashValid: true, signature: 'absent' });
  });
});

describe('A signed audit trail', () => {
  it('finds events at the end deleted, and the lock event of a seal gone', async () => {
    const calc = await lockedCalc('Tail deleted');
    expect(await verifyTrail()).toMatchObject({
      valid: true,
      signatures: { valid: true, unsigned: 0, firstInvalid: null },
      head: { status: 'valid' },
      problems: [],
    });
    // Deleting the last event (the lock) leaves a shorter chain whose hashes all hold.
    await sql(`delete from audit_events where seq = (select max(seq) from audit_events)`);
    const trail = await verifyTrail();
    expect(trail).toMatchObject({ valid: false, brokenAt: null, head: { status: 'ahead' } });
    expect(trail.problems).toContain(
      'Events at the end of the chain were deleted: it ends before its signed head',
    );
    const seal = await sealOf(calc.id);
    expect(seal).toMatchObject({
      valid: false,
      hashValid: true,
      signature: 'valid',
      lockEvent: 'missing',
    });
  });

  it('finds a rewritten tail whose hashes were all recomputed', async () => {
    await lockedCalc('Tail rewritten');
    const rows = (await sql(
      `select * from audit_events where seq >= (select max(seq) - 2 from audit_events) order by seq`,
    )) as {
      seq: number;
      calculation_id: string | null;
      actor_id: string;
      actor_name: string;
      action: string;
      detail: string | null;
      at: string;
      previous_hash: string;
    }[];
    let previous = rows[0].previous_hash;
    for (const row of rows) {
      const content: AuditContent = {
        seq: row.seq,
        calculationId: row.calculation_id,
        actorId: row.actor_id,
        actorName: row.seq === rows[0].seq ? 'Someone else' : row.actor_name,
        action: row.action,
        detail: row.detail === null ? null : (JSON.parse(row.detail) as Record<string, unknown>),
        at: row.at,
        previousHash: previous,
      };
      const hash = auditHash(content);
      await sql(
        `update audit_events set actor_name = ?, previous_hash = ?, hash = ? where seq = ?`,
        [content.actorName, previous, hash, row.seq],
      );
      previous = hash;
    }
    const trail = await verifyTrail();
    expect(trail.brokenAt).toBeNull();
    expect(trail.valid).toBe(false);
    expect(trail.signatures.firstInvalid).toBe(rows[0].seq);
    expect(trail.head.status).toBe('invalid');
  });
});
