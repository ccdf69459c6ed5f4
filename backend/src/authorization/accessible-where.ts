import { rulesToCondition } from '@casl/ability/extra';
import type { Action, Subject } from '@tiermode/shared-types';
import type { AppAbility } from './app-ability';

type Where = Record<string, unknown>;

/**
 * Turns the caller's rules for one action and subject into a MikroORM filter. CASL conditions
 * are MongoDB-style ($in, $ne, ...), which MikroORM's FilterQuery reads as they are. Returns null
 * when nothing is allowed, and {} when everything is.
 */
export function accessibleWhere(
  ability: AppAbility,
  action: Action,
  subjectType: Subject,
): Where | null {
  return rulesToCondition<AppAbility, Where, Where>(
    ability.rulesFor(action, subjectType),
    (rule) => {
      const conditions = (rule.conditions ?? {}) as Where;
      return rule.inverted ? { $not: conditions } : conditions;
    },
    {
      and: (conditions) => ({ $and: conditions }),
      or: (conditions) => (conditions.length === 1 ? conditions[0] : { $or: conditions }),
      empty: () => ({}),
    },
  );
}
