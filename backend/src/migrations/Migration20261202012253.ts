import { Migration } from '@mikro-orm/migrations';

/**
 * The units a calc is shown in. Generated, with the spurious table rebuilds removed
 * (DEVELOPERS.md, "Adding a migration").
 */
export class Migration20261202012253 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `alter table \`calculations\` add column \`display_units\` text not null default 'SI';`,
    );
  }
}
