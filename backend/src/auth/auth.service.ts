import { EntityManager } from '@mikro-orm/knex';
import { BadRequestException, Injectable, UnauthorizedException } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import type { LoginResponse, MeResponse } from '@tiermode/shared-types';
import type { AppAbility } from '../authorization/app-ability';
import { hashPassword, verifyPassword } from '../users/password-hasher';
import { hashToken } from '../users/set-password-link';
import { User } from '../users/user.entity';
import { toUserDto } from '../users/user.mapper';
import { JWT_LIFETIME_SECONDS, type TokenClaims } from './jwt-claims';
import { LoginThrottleService } from './login-throttle.service';

/** Says nothing about which part was wrong. */
const BAD_CREDENTIALS = 'Email or password is incorrect';

@Injectable()
export class AuthService {
  // Compared against when the email is unknown, so both failures take the same time.
  private readonly decoyHash = hashPassword('decoy-password-never-issued');

  constructor(
    private readonly em: EntityManager,
    private readonly jwt: JwtService,
    private readonly throttle: LoginThrottleService,
  ) {}

  async login(email: string, password: string, address: string): Promise<LoginResponse> {
    const attempt = { account: email.trim().toLowerCase(), address };
    this.throttle.assertNotBlocked(attempt);
    const user = await this.em.findOne(
      User,
      { email: email.trim().toLowerCase() },
      { populate: ['passwordHash'] },
    );
    const matches = await verifyPassword(password, user?.passwordHash ?? (await this.decoyHash));
    if (!user || !matches || !user.active) {
      await this.throttle.recordFailure(attempt);
      throw new UnauthorizedException(BAD_CREDENTIALS);
    }
    return this.issue(user);
  }

  me(user: User, ability: AppAbility): MeResponse {
    return { user: toUserDto(user), rules: ability.rules };
  }

  /** Signing out ends every session of the user: tokens issued before no longer work. */
  async logout(user: User): Promise<void> {
    user.sessionVersion += 1;
    await this.em.flush();
  }

  /** Changes the caller's password, ends its other sessions and returns a fresh token. */
  async changePassword(
    user: User,
    currentPassword: string,
    newPassword: string,
    address: string,
  ): Promise<LoginResponse> {
    const attempt = { account: user.email, address };
    this.throttle.assertNotBlocked(attempt);
    await this.em.populate(user, ['passwordHash']);
    if (!(await verifyPassword(currentPassword, user.passwordHash))) {
      await this.throttle.recordFailure(attempt);
      throw new UnauthorizedException('currentPassword is incorrect');
    }
    user.replacePassword(await hashPassword(newPassword));
    await this.em.flush();
    return this.issue(user);
  }

  /**
   * Sets the password of the account a one-time link was mailed for. The link works once and
   * expires; a wrong or used one counts as a failed sign-in for throttling.
   */
  async setPassword(token: string, password: string, address: string): Promise<void> {
    // A link names no account until it is found: counted per address.
    const attempt = { account: null, address };
    this.throttle.assertNotBlocked(attempt);
    const user = await this.em.findOne(User, { setPasswordTokenHash: hashToken(token) });
    if (
      !user ||
      !user.active ||
      !user.setPasswordExpiresAt ||
      user.setPasswordExpiresAt < new Date()
    ) {
      await this.throttle.recordFailure(attempt);
      throw new BadRequestException([
        'This set-password link is not valid, was used already, or has expired; ask your admin for a new one',
      ]);
    }
    user.replacePassword(await hashPassword(password));
    await this.em.flush();
  }

  private async issue(user: User): Promise<LoginResponse> {
    const claims: TokenClaims = { sub: user.id, sv: user.sessionVersion };
    const accessToken = await this.jwt.signAsync(claims);
    const expiresAt = new Date(Date.now() + JWT_LIFETIME_SECONDS * 1000).toISOString();
    return { accessToken, expiresAt, user: toUserDto(user) };
  }
}
