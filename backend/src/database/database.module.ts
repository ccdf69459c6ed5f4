import { MikroOrmModule } from '@mikro-orm/nestjs';
import { SqliteDriver } from '@mikro-orm/sqlite';
import { Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { AuditModule } from '../audit/audit.module';
import type { AppEnvironment } from '../config/environment';
import { createOrmConfig } from '../mikro-orm.config';
import { DatabaseLifecycle } from './database.lifecycle';

@Module({
  imports: [
    MikroOrmModule.forRootAsync({
      inject: [ConfigService],
      // Registers the SQLite-typed MikroORM and EntityManager for injection.
      driver: SqliteDriver,
      useFactory: (config: ConfigService<AppEnvironment, true>) =>
        createOrmConfig(config.get('databasePath', { infer: true })),
    }),
    // The seal key and the audit chain's head, for the demo seed.
    AuditModule,
  ],
  providers: [DatabaseLifecycle],
})
export class DatabaseModule {}
