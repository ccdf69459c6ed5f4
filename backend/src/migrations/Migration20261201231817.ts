import { Migration } from '@mikro-orm/migrations';

/** Saved calculations (drafts; review, lock and seal come in a later migration). */
export class Migration20261201231817 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table \`calculations\` (\`id\` text not null, \`project_id\` text not null, \`title\` text not null, \`revision\` integer not null default 1, \`status\` text check (\`status\` in ('draft', 'submitted', 'locked', 'superseded')) not null default 'draft', \`inputs\` json not null, \`analysis\` json null, \`engine_version\` text null, \`analysed_at\` datetime null, \`inputs_changed_at\` datetime not null, \`author_id\` text not null, \`created_at\` datetime not null, \`updated_at\` datetime not null, \`version\` integer not null default 1, constraint \`calculations_project_id_foreign\` foreign key(\`project_id\`) references \`projects\`(\`id\`) on update cascade, constraint \`calculations_author_id_foreign\` foreign key(\`author_id\`) references \`users\`(\`id\`) on update cascade, primary key (\`id\`));`,
    );
    this.addSql(
      `create index \`calculations_project_id_index\` on \`calculations\` (\`project_id\`);`,
    );
    this.addSql(
      `create index \`calculations_author_id_index\` on \`calculations\` (\`author_id\`);`,
    );
  }
}
