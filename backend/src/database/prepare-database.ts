import type { MikroORM } from '@mikro-orm/sqlite';
import type { AppEnvironment } from '../config/environment';
import { seedDemoCalculations } from './demo-calculations';
import { seedAccounts, type SeedOutcome } from './seed-accounts';

/** Applies the committed migrations, then seeds an empty database. Safe to run again. */
export async function prepareDatabase(
  orm: MikroORM,
  env: Pick<AppEnvironment, 'demoMode' | 'adminEmail' | 'adminPassword'>,
): Promise<{ applied: string[]; seed: SeedOutcome }> {
  const applied = await orm.getMigrator().up();
  const em = orm.em.fork();
  const seed = await seedAccounts(em, env);
  // The demo's buildings and calcs come with the demo accounts, on an empty database only.
  if (seed === 'demo-accounts-created') await seedDemoCalculations(em);
  return { applied: applied.map((m) => m.name), seed };
}
