import type { SqlOrm } from './sql-orm';
import { AuditEvent } from '../audit/audit-event.entity';
import type { AuditHead } from '../audit/audit-head';
import type { AppEnvironment } from '../config/environment';
import type { SigningKey } from '../signing/signing-key';
import { seedDemoCalculations } from './demo-calculations';
import { seedAccounts, type SeedOutcome } from './seed-accounts';

/** Applies the committed migrations, then seeds an empty database. Safe to run again. */
export async function prepareDatabase(
  orm: SqlOrm,
  env: Pick<AppEnvironment, 'demoMode' | 'adminEmail' | 'adminPassword'>,
  signing: { key: SigningKey; head: AuditHead },
): Promise<{ applied: string[]; seed: SeedOutcome }> {
  const applied = await orm.getMigrator().up();
  const em = orm.em.fork();
  const seed = await seedAccounts(em, env);
  // The demo's buildings and calcs come with the demo accounts, on an empty database only.
  if (seed === 'demo-accounts-created') {
    await seedDemoCalculations(em, signing.key);
    const [last] = await em.find(AuditEvent, {}, { orderBy: { seq: 'desc' }, limit: 1 });
    if (last) signing.head.advance(last.seq, last.hash);
  }
  return { applied: applied.map((m) => m.name), seed };
}
