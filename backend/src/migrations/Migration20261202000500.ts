import { Migration } from '@mikro-orm/migrations';

/** What a review comment refers to, and whether it is resolved. Written by hand (DEVELOPERS.md). */
export class Migration20261202000500 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter table \`review_comments\` add column \`target\` text null;`);
    this.addSql(
      `alter table \`review_comments\` add column \`resolved\` integer not null default false;`,
    );
  }
}
