import { Migration } from '@mikro-orm/migrations';

/**
 * Files kept with a calc, with their SHA-256. Generated, with the spurious table rebuilds removed
 * (DEVELOPERS.md, "Adding a migration").
 */
export class Migration20261202015831 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      'create table `attachments` (`id` text not null, `calculation_id` text not null, `file_name` text not null, `stored_name` text not null, `content_type` text not null, `size` integer not null, `sha256` text not null, `uploaded_by_id` text not null, `uploaded_at` datetime not null, constraint `attachments_calculation_id_foreign` foreign key(`calculation_id`) references `calculations`(`id`) on update cascade, constraint `attachments_uploaded_by_id_foreign` foreign key(`uploaded_by_id`) references `users`(`id`) on update cascade, primary key (`id`));',
    );
    this.addSql(
      'create index `attachments_calculation_id_index` on `attachments` (`calculation_id`);',
    );
    this.addSql(
      'create index `attachments_uploaded_by_id_index` on `attachments` (`uploaded_by_id`);',
    );
  }
}
