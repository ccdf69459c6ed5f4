import { Migration } from '@mikro-orm/migrations';

/**
 * Each audit event's Ed25519 signature. Generated, with the spurious table rebuilds removed
 * (DEVELOPERS.md, "Adding a migration"). Events made before it stay unsigned, and
 * GET /api/audit/verify counts them.
 */
export class Migration20261203074322 extends Migration {
  override async up(): Promise<void> {
    this.addSql('alter table `audit_events` add column `signature` text null;');
  }
}
