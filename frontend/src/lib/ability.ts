import { createMongoAbility, type MongoAbility, type RawRuleOf } from '@casl/ability';
import { useAbility } from '@casl/react';
import type { AbilityRule, Action, Subject } from '@tiermode/shared-types';

/** The same ability the server enforces, rebuilt from the rules of GET /api/auth/me. */
export type AppAbility = MongoAbility<[Action, Subject]>;

export function buildAbility(rules: AbilityRule[]): AppAbility {
  return createMongoAbility<[Action, Subject]>(rules as RawRuleOf<AppAbility>[]);
}

/** The signed-in user's ability, from the AbilityProvider of the app shell. */
export const useAppAbility = () => useAbility<AppAbility>();
