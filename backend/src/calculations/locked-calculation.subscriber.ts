import {
  ChangeSetType,
  type ChangeSet,
  type EventSubscriber,
  type FlushEventArgs,
} from '@mikro-orm/core';
import { Calculation } from './calculation.entity';

/**
 * The entity-layer guard behind the services' 409s: a locked or superseded calculation is never
 * written again, except that a locked one may become superseded (its status alone). Anything
 * else aborts the whole flush, so no code path can change a calc of record.
 */
export class LockedCalculationSubscriber implements EventSubscriber<Calculation> {
  onFlush(args: FlushEventArgs): void {
    for (const changeSet of args.uow.getChangeSets()) {
      if (changeSet.entity instanceof Calculation) check(changeSet as ChangeSet<Calculation>);
    }
  }
}

function check(changeSet: ChangeSet<Calculation>): void {
  const before = changeSet.originalEntity as Record<string, unknown> | undefined;
  const status = before?.status;
  if (changeSet.type === ChangeSetType.DELETE && typeof status === 'string' && status !== 'draft') {
    throw new Error(`A ${status} calculation cannot be deleted`);
  }
  if (changeSet.type !== ChangeSetType.UPDATE || !before) return;
  if (status !== 'locked' && status !== 'superseded') return;
  // Only values that really differ from the stored ones count. (MikroORM 6 on SQLite once listed
  // unchanged dates in every payload, with `type: 'datetime'`; the entities now declare
  // DateTimeType, and this comparison stays so that such a payload could never pass for a change.)
  const payload = changeSet.payload as Record<string, unknown>;
  const changed = Object.keys(payload).filter(
    (key) =>
      key !== 'version' &&
      key !== 'updatedAt' &&
      comparable(payload[key]) !== comparable(before[key]),
  );
  if (changed.length === 0) return;
  const supersedes =
    status === 'locked' &&
    changed.every((key) => key === 'status') &&
    payload.status === 'superseded';
  if (!supersedes) {
    throw new Error(`A ${status} calculation cannot change (${changed.join(', ')})`);
  }
}

/** Dates may come as Date, ISO text or epoch milliseconds on either side; compare them as numbers. */
function comparable(value: unknown): string {
  if (value instanceof Date) return String(value.getTime());
  if (typeof value === 'string' && /^\d{4}-\d\d-\d\dT/.test(value))
    return String(Date.parse(value));
  return JSON.stringify(value) ?? 'undefined';
}
