import { Migration } from '@mikro-orm/migrations';

/** Mail: messages queued, sent or failed, and those the local catcher received. */
export class Migration20261201233733 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table \`mail_messages\` (\`id\` text not null, \`status\` text check (\`status\` in ('received', 'queued', 'sent', 'failed')) not null, \`from\` text not null, \`to\` text not null, \`subject\` text not null, \`text\` text not null, \`attempts\` integer not null default 0, \`last_error\` text null, \`created_at\` datetime not null, \`sent_at\` datetime null, primary key (\`id\`));`,
    );
  }
}
