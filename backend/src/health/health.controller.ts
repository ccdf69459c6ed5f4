import { EntityManager, MikroORM } from '@mikro-orm/knex';
import { Controller, Get, ServiceUnavailableException } from '@nestjs/common';
import type { HealthResponse } from '@tiermode/shared-types';
import { Public } from '../common/decorators/public.decorator';
import { ApiContract } from '../openapi/api-contract.decorator';

@Controller('health')
export class HealthController {
  /**
   * Migrations run only at start-up, from a list in the code, so once none is pending none will
   * be for the life of this process: the check is made until it first passes, then skipped.
   */
  private migrated = false;

  constructor(
    private readonly orm: MikroORM,
    private readonly em: EntityManager,
  ) {}

  /** 200 once the database is open and every committed migration is applied. */
  @Public()
  @ApiContract({ summary: 'Whether the server and its database answer', returns: 'HealthResponse' })
  @Get()
  async check(): Promise<HealthResponse> {
    try {
      await this.em.getConnection().execute('select 1');
      if (!this.migrated) {
        const pending = await this.orm.getMigrator().getPendingMigrations();
        if (pending.length > 0) throw new Error(`${pending.length} migrations pending`);
        this.migrated = true;
      }
    } catch {
      throw new ServiceUnavailableException('The database is not ready');
    }
    return { status: 'ok' };
  }
}
