import { createSecretKey } from 'node:crypto';
import { EntityManager } from '@mikro-orm/knex';
import { Injectable, UnauthorizedException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { PassportStrategy } from '@nestjs/passport';
import { ExtractJwt, Strategy } from 'passport-jwt';
import type { AppEnvironment } from '../config/environment';
import { User } from '../users/user.entity';
import { JWT_ALGORITHM, JWT_AUDIENCE, JWT_ISSUER, type TokenClaims } from './jwt-claims';
import { SignedInUsers } from './signed-in-users';

/**
 * passport-jwt verifies the token (signature with HS256 only, expiry, issuer, audience); this
 * strategy then loads the user (kept in memory between changes: SignedInUsers), so a deactivated
 * user or a token from before the last sign-out or password change is refused at once.
 */
@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(
    config: ConfigService<AppEnvironment, true>,
    private readonly em: EntityManager,
    private readonly users: SignedInUsers,
  ) {
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      // A KeyObject made once: given a string, jsonwebtoken 9 first tries to read it as a public
      // key (and fails) on every request, a tenth of the server's time under load. Its types
      // say string | Buffer; jsonwebtoken takes a KeyObject as well.
      secretOrKey: createSecretKey(
        new TextEncoder().encode(config.get('jwtSecret', { infer: true })),
      ) as unknown as Buffer,
      algorithms: [JWT_ALGORITHM],
      issuer: JWT_ISSUER,
      audience: JWT_AUDIENCE,
      ignoreExpiration: false,
    });
  }

  async validate(claims: TokenClaims): Promise<User> {
    if (typeof claims.sub !== 'string' || typeof claims.sv !== 'number') {
      throw new UnauthorizedException('Your sign-in is not valid; please sign in again');
    }
    const user = await this.users.find(this.em, claims.sub);
    if (!user || !user.active || user.sessionVersion !== claims.sv) {
      throw new UnauthorizedException('Your sign-in has ended; please sign in again');
    }
    return user;
  }
}
