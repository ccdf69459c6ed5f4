import { CanActivate, ExecutionContext, ForbiddenException, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { IS_PUBLIC_KEY } from '../common/decorators/public.decorator';
import type { AuthenticatedRequest } from './authenticated-request';
import { AbilityFactory } from './ability.factory';
import { CHECK_POLICIES_KEY, type PolicyHandler } from './check-policies.decorator';

/**
 * Runs after the JWT guard on every route. Builds the caller's ability once per request, keeps it
 * on the request for the services, and refuses the request unless every declared policy holds.
 * A route that is neither public nor declares a policy is refused: forgetting is not allowing.
 */
@Injectable()
export class PoliciesGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly abilityFactory: AbilityFactory,
  ) {}

  canActivate(context: ExecutionContext): boolean {
    const targets = [context.getHandler(), context.getClass()];
    if (this.reflector.getAllAndOverride<boolean>(IS_PUBLIC_KEY, targets)) return true;

    const handlers = this.reflector.getAllAndOverride<PolicyHandler[] | undefined>(
      CHECK_POLICIES_KEY,
      targets,
    );
    if (!handlers || handlers.length === 0) {
      throw new ForbiddenException('This route declares no access policy');
    }
    const request = context.switchToHttp().getRequest<AuthenticatedRequest>();
    const ability = this.abilityFactory.createForUser(request.user);
    request.ability = ability;
    if (!handlers.every((handler) => handler(ability))) {
      throw new ForbiddenException('You do not have permission to do this');
    }
    return true;
  }
}
