import type { MikroORM } from '@mikro-orm/sqlite';
import type { AppEnvironment } from '../config/environment';
import { seedAccounts, type SeedOutcome } from './seed-accounts';

/** Applies the committed migrations, then seeds an empty database. Safe to run again. */
export async function prepareDatabase(
  orm: MikroORM,
  env: Pick<AppEnvironment, 'demoMode' | 'adminEmail' | 'adminPassword'>,
): Promise<{ applied: string[]; seed: SeedOutcome }> {
  const applied = await orm.getMigrator().up();
  const seed = await seedAccounts(orm.em.fork(), env);
  return { applied: applied.map((m) => m.name), seed };
}
