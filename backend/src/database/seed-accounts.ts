import type { EntityManager } from '@mikro-orm/knex';
import type { AppEnvironment } from '../config/environment';
import { passwordProblem, personalWords } from '../users/password-policy';
import { hashPassword } from '../users/password-hasher';
import { User } from '../users/user.entity';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from './demo-accounts';

export type SeedOutcome = 'demo-accounts-created' | 'first-admin-created' | 'nothing-to-do';

/**
 * On an empty database: the demo accounts in demo mode, or the first admin from ADMIN_EMAIL and
 * ADMIN_PASSWORD with DEMO=off. With DEMO=off the demo accounts never work, even if an earlier
 * demo run left them in the database: they are deactivated.
 */
export async function seedAccounts(
  em: EntityManager,
  env: Pick<AppEnvironment, 'demoMode' | 'adminEmail' | 'adminPassword'>,
  today: Date = new Date(),
): Promise<SeedOutcome> {
  const demoEmails = DEMO_ACCOUNTS.map((a) => a.email);
  const empty = (await em.count(User, {})) === 0;

  if (!env.demoMode) {
    const leftovers = await em.find(User, { email: { $in: demoEmails }, active: true });
    for (const user of leftovers) {
      user.active = false;
      user.sessionVersion += 1;
    }
    if (!empty) {
      await em.flush();
      return 'nothing-to-do';
    }
    const { adminEmail, adminPassword } = env;
    if (!adminEmail || !adminPassword) {
      throw new Error(
        'DEMO=off on an empty database: set ADMIN_EMAIL and ADMIN_PASSWORD to create the first admin',
      );
    }
    const problem = passwordProblem('ADMIN_PASSWORD', adminPassword, personalWords(adminEmail));
    if (problem) throw new Error(problem);
    em.create(User, {
      email: adminEmail.trim().toLowerCase(),
      name: 'Administrator',
      role: 'admin',
      passwordHash: await hashPassword(adminPassword),
    });
    await em.flush();
    return 'first-admin-created';
  }

  if (!empty) return 'nothing-to-do';
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const expiry = new Date(today);
  expiry.setUTCFullYear(expiry.getUTCFullYear() + 2);
  for (const account of DEMO_ACCOUNTS) {
    em.create(User, {
      email: account.email,
      name: account.name,
      role: account.role,
      passwordHash,
      licenseNumber: account.licence?.number ?? null,
      licenseJurisdiction: account.licence?.jurisdiction ?? null,
      licenseExpiresOn: account.licence ? expiry.toISOString().slice(0, 10) : null,
    });
  }
  await em.flush();
  return 'demo-accounts-created';
}
