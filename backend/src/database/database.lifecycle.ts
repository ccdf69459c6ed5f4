import { MikroORM, type AbstractSqlDriver, type EntityManager } from '@mikro-orm/knex';
import { Injectable, Logger, OnModuleInit } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { AppEnvironment } from '../config/environment';
import { AuditHead } from '../audit/audit-head';
import { SigningKey } from '../signing/signing-key';
import { prepareDatabase } from './prepare-database';

/**
 * The server migrates and seeds before it listens, so a bare `npm run serve` also works. It does
 * so while the modules initialise, so that every `onApplicationBootstrap` hook (the mail sweep)
 * finds the database ready.
 */
@Injectable()
export class DatabaseLifecycle implements OnModuleInit {
  private readonly logger = new Logger('Database');

  constructor(
    private readonly orm: MikroORM<AbstractSqlDriver, EntityManager>,
    private readonly config: ConfigService<AppEnvironment, true>,
    private readonly key: SigningKey,
    private readonly head: AuditHead,
  ) {}

  async onModuleInit(): Promise<void> {
    const { applied, seed } = await prepareDatabase(
      this.orm,
      {
        demoMode: this.config.get('demoMode', { infer: true }),
        adminEmail: this.config.get('adminEmail', { infer: true }),
        adminPassword: this.config.get('adminPassword', { infer: true }),
      },
      { key: this.key, head: this.head },
    );
    if (applied.length > 0) this.logger.log(`Applied migrations: ${applied.join(', ')}`);
    if (seed !== 'nothing-to-do') this.logger.log(`Seed: ${seed}`);
  }
}
