import 'reflect-metadata';
import { MikroORM } from '@mikro-orm/sqlite';
import { loadEnvironment } from '../config/environment';
import { prepareDatabase } from '../database/prepare-database';
import { createOrmConfig } from '../mikro-orm.config';

/** `npm run migrate -w backend`: applies the committed migrations and seeds an empty database. */
async function main(): Promise<void> {
  const env = loadEnvironment(process.env);
  const orm = await MikroORM.init(createOrmConfig(env.databasePath));
  try {
    const { applied, seed } = await prepareDatabase(orm, env);
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
