import { Migration } from '@mikro-orm/migrations';

/** The one-time set-password link of a new account. Written by hand (see DEVELOPERS.md). */
export class Migration20261201235500 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter table \`users\` add column \`set_password_token_hash\` text null;`);
    this.addSql(`alter table \`users\` add column \`set_password_expires_at\` datetime null;`);
  }
}
