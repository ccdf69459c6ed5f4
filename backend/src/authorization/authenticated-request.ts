import type { Request } from 'express';
import type { User } from '../users/user.entity';
import type { AppAbility } from './app-ability';

/** A request that passed the JWT guard (user) and the policies guard (ability). */
export interface AuthenticatedRequest extends Request {
  user: User;
  ability: AppAbility;
}
