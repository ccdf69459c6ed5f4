import { Migration } from '@mikro-orm/migrations';

/**
 * A queued mail's claim: the server sending it sets it a while ahead, so that with several app
 * servers each message is sent once; after a failed attempt it holds the time of the next.
 */
export class Migration20261205193352 extends Migration {
  override async up(): Promise<void> {
    this.addSql('alter table `mail_messages` add column `claimed_until` datetime null;');
  }
}
