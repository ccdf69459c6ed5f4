import { Migration } from '@mikro-orm/migrations';

/**
 * A calc's response history: its record and setup (an input), its stored results, and the setup
 * of the submission last returned (what the reviewer's "What changed" compares with).
 */
export class Migration20261203171500 extends Migration {
  override async up(): Promise<void> {
    this.addSql('alter table `calculations` add column `history` json null;');
    this.addSql('alter table `calculations` add column `history_results` json null;');
    this.addSql('alter table `calculations` add column `returned_history` json null;');
  }
}
