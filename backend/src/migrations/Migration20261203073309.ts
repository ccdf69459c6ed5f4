import { Migration } from '@mikro-orm/migrations';

/**
 * At most one next revision of a calc: parallel revise requests once made up to eight revision-2
 * drafts, two of which could be locked. Generated, with the spurious table rebuilds removed
 * (DEVELOPERS.md, "Adding a migration"). A database that already holds two next revisions of one
 * calc stops here with the index error; keep the one that was locked (or the oldest) and remove
 * the other drafts first.
 */
export class Migration20261203073309 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      'create unique index `calculations_previous_revision_id_unique` on `calculations` (`previous_revision_id`);',
    );
  }
}
