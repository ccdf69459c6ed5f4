import { Migration } from '@mikro-orm/migrations';

/**
 * A calc's code basis and the checks stored with its analysis. Generated, with the spurious table
 * rebuilds removed (DEVELOPERS.md, "Adding a migration").
 */
export class Migration20261202022030 extends Migration {
  override async up(): Promise<void> {
    this.addSql('alter table `calculations` add column `basis` json null;');
    this.addSql('alter table `calculations` add column `checks` json null;');
  }
}
