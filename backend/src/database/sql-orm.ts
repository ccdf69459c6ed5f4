import type { AbstractSqlDriver, EntityManager, MikroORM } from '@mikro-orm/knex';

/**
 * MikroORM on any of its SQL drivers, with the SQL EntityManager (query builder, execute). The
 * code outside `mikro-orm.config.ts` names no driver: SQLite today, PostgreSQL next (issue 17).
 * For Nest injection, write the type out (`MikroORM<AbstractSqlDriver, EntityManager>`): the
 * injection token is the class, which an alias would hide from the decorator metadata.
 */
export type SqlOrm = MikroORM<AbstractSqlDriver, EntityManager>;
