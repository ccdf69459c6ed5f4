import { Migration } from '@mikro-orm/migrations';

/**
 * The inputs and basis of the submission last returned (so the reviewer sees what changed since),
 * and comments
 * tied to a storey and answering another comment. Generated, with the spurious table rebuilds
 * removed (DEVELOPERS.md, "Adding a migration"); MikroORM 6.6 also put the parent's foreign key
 * on the `storey` column, so that statement is written as it should be, on `parent_id`.
 */
export class Migration20261203143328 extends Migration {
  override async up(): Promise<void> {
    this.addSql('alter table `calculations` add column `returned_inputs` json null;');
    this.addSql('alter table `calculations` add column `returned_basis` json null;');
    this.addSql('alter table `review_comments` add column `storey` integer null;');
    this.addSql(
      'alter table `review_comments` add column `parent_id` text null constraint `review_comments_parent_id_foreign` references `review_comments` (`id`) on delete cascade on update cascade;',
    );
    this.addSql(
      'create index `review_comments_parent_id_index` on `review_comments` (`parent_id`);',
    );
  }
}
