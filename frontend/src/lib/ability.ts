import { createMongoAbility, subject, type MongoAbility, type RawRuleOf } from '@casl/ability';
import { useAbility } from '@casl/react';
import type { AbilityRule, Action, Subject } from '@tiermode/shared-types';

/** The same ability the server enforces, rebuilt from the rules of GET /api/auth/me. */
export type AppAbility = MongoAbility<[Action, Subject]>;

export function buildAbility(rules: AbilityRule[]): AppAbility {
  return createMongoAbility<[Action, Subject]>(rules as RawRuleOf<AppAbility>[]);
}

/** The signed-in user's ability, from the AbilityProvider of the app shell. */
export const useAppAbility = () => useAbility<AppAbility>();

/**
 * Whether the ability allows `action` on one record (CASL's conditions, such as "a member of the
 * project" or "a draft", are checked against its fields), as the server checks it.
 */
export function canOn(
  ability: AppAbility,
  action: Action,
  type: Subject,
  record: Record<string, unknown>,
): boolean {
  return ability.can(action, subject(type, { ...record }) as unknown as Subject);
}
