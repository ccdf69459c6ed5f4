import { defineConfig } from '@mikro-orm/sqlite';
import { Migrator } from '@mikro-orm/migrations';
import { loadEnvironment } from './config/environment';
import { MIGRATIONS } from './migrations';
import { AuditEvent } from './audit/audit-event.entity';
import { Calculation } from './calculations/calculation.entity';
import { LockedCalculationSubscriber } from './calculations/locked-calculation.subscriber';
import { Attachment } from './calculations/attachment.entity';
import { ReviewComment } from './calculations/review-comment.entity';
import { MailMessage } from './mail/mail-message.entity';
import { Project } from './projects/project.entity';
import { User } from './users/user.entity';

type Sqlite3Connection = { exec(sql: string, callback: (error: Error | null) => void): void };

/**
 * MikroORM 6 sets only `foreign_keys` on connect. Every new connection also gets WAL journaling,
 * full fsync on commit (an acknowledged write survives a power cut) and a busy timeout. The pool
 * holds exactly one connection: the sqlite3 driver misbehaves with more.
 */
const CONNECTION_PRAGMAS = [
  'PRAGMA journal_mode = WAL;',
  'PRAGMA synchronous = FULL;',
  'PRAGMA busy_timeout = 5000;',
  'PRAGMA foreign_keys = ON;',
].join(' ');

export function createOrmConfig(databasePath: string) {
  return defineConfig({
    dbName: databasePath,
    entities: [User, Project, Calculation, ReviewComment, Attachment, AuditEvent, MailMessage],
    subscribers: [new LockedCalculationSubscriber()],
    extensions: [Migrator],
    // Schema changes go through committed migrations only.
    ensureDatabase: false,
    allowGlobalContext: false,
    forceUtcTimezone: true,
    pool: {
      min: 1,
      max: 1,
      afterCreate: (
        connection: Sqlite3Connection,
        done: (error: Error | null, c: unknown) => void,
      ) => connection.exec(CONNECTION_PRAGMAS, (error) => done(error, connection)),
    },
    migrations: {
      tableName: 'mikro_orm_migrations',
      path: 'dist/migrations',
      pathTs: 'src/migrations',
      snapshotName: '.snapshot-tiermode',
      // Listed in code so the same list runs from TypeScript (tests, CLI) and from the build.
      migrationsList: MIGRATIONS,
      transactional: true,
      allOrNothing: true,
      emit: 'ts',
      // Tiermode reports the applied migrations once, itself.
      silent: true,
    },
  });
}

// Used by the MikroORM CLI (`npm run migration:create -w backend`).
export default createOrmConfig(loadEnvironment(process.env).databasePath);
