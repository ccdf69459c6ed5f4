import { SetMetadata } from '@nestjs/common';
import type { AppAbility } from './app-ability';

export type PolicyHandler = (ability: AppAbility) => boolean;

export const CHECK_POLICIES_KEY = 'tiermode:checkPolicies';

/**
 * The type-level permission a route needs, checked by PoliciesGuard before the handler runs.
 * Services then check the ability against the record they loaded.
 */
export const CheckPolicies = (...handlers: PolicyHandler[]) =>
  SetMetadata(CHECK_POLICIES_KEY, handlers);
