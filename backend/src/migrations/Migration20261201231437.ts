import { Migration } from '@mikro-orm/migrations';

/** Projects and their members. */
export class Migration20261201231437 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table \`projects\` (\`id\` text not null, \`name\` text not null, \`site\` text null, \`created_by_id\` text not null, \`created_at\` datetime not null, \`updated_at\` datetime not null, \`version\` integer not null default 1, constraint \`projects_created_by_id_foreign\` foreign key(\`created_by_id\`) references \`users\`(\`id\`) on update cascade, primary key (\`id\`));`,
    );
    this.addSql(
      `create index \`projects_created_by_id_index\` on \`projects\` (\`created_by_id\`);`,
    );

    this.addSql(
      `create table \`project_members\` (\`project_id\` text not null, \`user_id\` text not null, constraint \`project_members_project_id_foreign\` foreign key(\`project_id\`) references \`projects\`(\`id\`) on delete cascade on update cascade, constraint \`project_members_user_id_foreign\` foreign key(\`user_id\`) references \`users\`(\`id\`) on delete cascade on update cascade, primary key (\`project_id\`, \`user_id\`));`,
    );
    this.addSql(
      `create index \`project_members_project_id_index\` on \`project_members\` (\`project_id\`);`,
    );
    this.addSql(
      `create index \`project_members_user_id_index\` on \`project_members\` (\`user_id\`);`,
    );
  }
}
