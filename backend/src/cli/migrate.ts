import 'reflect-metadata';
import { MikroORM } from '@mikro-orm/knex';
import { loadEnvironment } from '../config/environment';
import { AuditHead } from '../audit/audit-head';
import { prepareDatabase } from '../database/prepare-database';
import { SigningKey } from '../signing/signing-key';
import { createOrmConfig } from '../mikro-orm.config';

/** `npm run migrate -w backend`: applies the committed migrations and seeds an empty database. */
async function main(): Promise<void> {
  const env = loadEnvironment(process.env);
  const orm = await MikroORM.init(createOrmConfig(env.databasePath));
  try {
    const key = new SigningKey(env.sealPrivateKeyPem);
    const { applied, seed } = await prepareDatabase(orm, env, {
      key,
      head: new AuditHead(env.auditHeadPath, key),
    });
    console.log(
      `Database ${env.databasePath}: ${applied.length} migration(s) applied; seed: ${seed}`,
    );
  } finally {
    await orm.close();
  }
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
