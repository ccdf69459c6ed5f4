import { Migration } from '@mikro-orm/migrations';

/** The audit trail (a hash chain of events). */
export class Migration20261201233354 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table \`audit_events\` (\`seq\` integer not null, \`calculation_id\` text null, \`actor_id\` text not null, \`actor_name\` text not null, \`action\` text not null, \`detail\` json null, \`at\` text not null, \`previous_hash\` text not null, \`hash\` text not null, primary key (\`seq\`));`,
    );
    this.addSql(
      `create index \`audit_events_calculation_id_index\` on \`audit_events\` (\`calculation_id\`);`,
    );
  }
}
