import {
  ChangeSetType,
  MikroORM,
  type EntityData,
  type EventArgs,
  type EventSubscriber,
  type FlushEventArgs,
  type TransactionEventArgs,
} from '@mikro-orm/core';
import { EntityManager } from '@mikro-orm/knex';
import { Injectable, type OnModuleInit } from '@nestjs/common';
import { User } from '../users/user.entity';

/** Rows kept at most; far above any firm's staff, so the map never grows without bound. */
const MAX_ROWS = 10_000;

/**
 * The signed-in user of each request, without a database round trip per request: the user's row
 * is read once and kept in this process, and every change to a user (a deactivation, a sign-out,
 * a password or role change) drops it the moment MikroORM writes the change, so the next request
 * reads the row again and a deactivation still takes effect at once. Each request still gets its
 * own managed entity (`em.map` of the kept row), as if it had been loaded.
 *
 * This relies on every change to a user going through this process's MikroORM (true today: the
 * API is the only writer, and it runs as one process on SQLite). Several processes sharing one
 * database would each need to hear the others' changes (issue 17).
 */
@Injectable()
export class SignedInUsers implements EventSubscriber<User>, OnModuleInit {
  private readonly rows = new Map<string, EntityData<User>>();

  constructor(private readonly orm: MikroORM) {}

  onModuleInit(): void {
    this.orm.em.getEventManager().registerSubscriber(this);
  }

  getSubscribedEntities() {
    return [User];
  }

  /** The user, managed by `em`, or null when there is none with this id. */
  async find(em: EntityManager, id: string): Promise<User | null> {
    let row = this.rows.get(id);
    if (!row) {
      const found = await em
        .createQueryBuilder(User)
        .select('*')
        .where({ id })
        .limit(1)
        .execute<EntityData<User> | undefined>('get', false);
      if (!found) return null;
      row = found;
      if (this.rows.size >= MAX_ROWS) this.rows.delete(this.rows.keys().next().value as string);
      this.rows.set(id, row);
    }
    return em.map(User, { ...row });
  }

  // Dropped when the change is written, and again once its flush and its transaction are over,
  // so that no reader in between can keep the row from before the change.
  afterUpdate(args: EventArgs<User>): void {
    this.rows.delete(args.entity.id);
  }

  afterDelete(args: EventArgs<User>): void {
    this.rows.delete(args.entity.id);
  }

  afterUpsert(args: EventArgs<User>): void {
    this.rows.delete(args.entity.id);
  }

  afterFlush(args: FlushEventArgs): void {
    this.dropChanged(args.uow.getChangeSets());
  }

  afterTransactionCommit(args: TransactionEventArgs): void {
    if (args.uow) this.dropChanged(args.uow.getChangeSets());
  }

  /** For tests: how many rows are kept. */
  get size(): number {
    return this.rows.size;
  }

  private dropChanged(changeSets: readonly { entity: object; type: ChangeSetType }[]): void {
    for (const changeSet of changeSets) {
      if (changeSet.entity instanceof User) this.rows.delete(changeSet.entity.id);
    }
  }
}
