import { Migration } from '@mikro-orm/migrations';

export class Migration20261201215434 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table \`users\` (\`id\` text not null, \`email\` text not null, \`name\` text not null, \`role\` text check (\`role\` in ('admin', 'designer', 'reviewer', 'student')) not null, \`password_hash\` text not null, \`active\` integer not null default true, \`session_version\` integer not null default 1, \`license_number\` text null, \`license_jurisdiction\` text null, \`license_expires_on\` text null, \`created_at\` datetime not null, \`updated_at\` datetime not null, \`version\` integer not null default 1, primary key (\`id\`));`,
    );
    this.addSql(`create unique index \`users_email_unique\` on \`users\` (\`email\`);`);
  }
}
