import { MikroOrmModule } from '@mikro-orm/nestjs';
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
      // No driver named here: the module then registers @mikro-orm/knex's EntityManager (every
      // SQL driver's), which the services inject, beside the core MikroORM and EntityManager.
      useFactory: (config: ConfigService<AppEnvironment, true>) =>
        createOrmConfig(config.get('databasePath', { infer: true })),
    }),
    // The seal key and the audit chain's head, for the demo seed.
    AuditModule,
  ],
  providers: [DatabaseLifecycle],
})
export class DatabaseModule {}
