import { Migration } from '@mikro-orm/migrations';

/**
 * Review and lock: review comments, and the reviewer, times, seal and previous revision of a
 * calculation. Edited by hand: the generated SQL put both new foreign keys on one column.
 */
export class Migration20261201232131 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table \`review_comments\` (\`id\` text not null, \`calculation_id\` text not null, \`author_id\` text not null, \`body\` text not null, \`created_at\` datetime not null, constraint \`review_comments_calculation_id_foreign\` foreign key(\`calculation_id\`) references \`calculations\`(\`id\`) on update cascade, constraint \`review_comments_author_id_foreign\` foreign key(\`author_id\`) references \`users\`(\`id\`) on update cascade, primary key (\`id\`));`,
    );
    this.addSql(
      `create index \`review_comments_calculation_id_index\` on \`review_comments\` (\`calculation_id\`);`,
    );
    this.addSql(
      `create index \`review_comments_author_id_index\` on \`review_comments\` (\`author_id\`);`,
    );

    this.addSql(
      `alter table \`calculations\` add column \`reviewer_id\` text null constraint \`calculations_reviewer_id_foreign\` references \`users\` (\`id\`) on update cascade on delete set null;`,
    );
    this.addSql(`alter table \`calculations\` add column \`submitted_at\` datetime null;`);
    this.addSql(`alter table \`calculations\` add column \`returned_at\` datetime null;`);
    this.addSql(`alter table \`calculations\` add column \`locked_at\` datetime null;`);
    this.addSql(`alter table \`calculations\` add column \`seal\` json null;`);
    this.addSql(
      `alter table \`calculations\` add column \`previous_revision_id\` text null constraint \`calculations_previous_revision_id_foreign\` references \`calculations\` (\`id\`) on update cascade on delete set null;`,
    );
    this.addSql(
      `create index \`calculations_reviewer_id_index\` on \`calculations\` (\`reviewer_id\`);`,
    );
    this.addSql(
      `create index \`calculations_previous_revision_id_index\` on \`calculations\` (\`previous_revision_id\`);`,
    );
  }
}
