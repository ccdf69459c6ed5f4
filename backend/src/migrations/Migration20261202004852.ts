import { Migration } from '@mikro-orm/migrations';

/**
 * A project's code basis and structural system (the library filters on both). Generated, with
 * the spurious table rebuilds removed (DEVELOPERS.md, "Adding a migration").
 */
export class Migration20261202004852 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter table \`projects\` add column \`code_basis\` text not null default 'USER';`);
    this.addSql(`alter table \`projects\` add column \`structural_system\` text null;`);
  }
}
