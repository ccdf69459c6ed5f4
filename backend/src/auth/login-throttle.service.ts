import { Inject, Injectable } from '@nestjs/common';
import { ThrottlerException, ThrottlerStorage, ThrottlerStorageService } from '@nestjs/throttler';

/** Failed attempts a minute for one account from one address. */
export const LOGIN_FAILURE_LIMIT = 10;
/**
 * Failed attempts a minute from one address over all accounts: a guard against trying one
 * password on many accounts, high enough that one colleague's typos behind an office's shared
 * address lock no one else out.
 */
export const ADDRESS_FAILURE_LIMIT = 100;
export const LOGIN_FAILURE_WINDOW_MS = 60_000;
const THROTTLER_NAME = 'login-failures';

/** Who is trying: the account (email or user id; null when there is none, as for a link) and the address. */
export interface SignInAttempt {
  account: string | null;
  address: string;
}

/**
 * Counts failed sign-ins in @nestjs/throttler's storage, per account and address, and per
 * address alone with a higher limit. The stock ThrottlerGuard counts every request, successful
 * or not; the rule here is about failures: past a limit in a minute, 429 until the minute is over.
 */
@Injectable()
export class LoginThrottleService {
  /** The limits in force (a test may lower them, as each failure costs a password hash). */
  readonly limits = { account: LOGIN_FAILURE_LIMIT, address: ADDRESS_FAILURE_LIMIT };

  constructor(@Inject(ThrottlerStorage) private readonly storage: ThrottlerStorageService) {}

  /** Refuses an attempt whose account-and-address or address is blocked, before any check. */
  assertNotBlocked(attempt: SignInAttempt): void {
    for (const { key } of this.counters(attempt)) {
      const record = this.storage.storage.get(key);
      if (record?.isBlocked && record.blockExpiresAt > Date.now()) throw this.tooMany();
    }
  }

  /** Records one failure; the failure that passes a limit is itself answered with 429. */
  async recordFailure(attempt: SignInAttempt): Promise<void> {
    let blocked = false;
    for (const { key, limit } of this.counters(attempt)) {
      const record = await this.storage.increment(
        key,
        LOGIN_FAILURE_WINDOW_MS,
        limit,
        LOGIN_FAILURE_WINDOW_MS,
        THROTTLER_NAME,
      );
      blocked ||= record.isBlocked;
    }
    if (blocked) throw this.tooMany();
  }

  private counters({ account, address }: SignInAttempt): { key: string; limit: number }[] {
    const perAddress = { key: `${THROTTLER_NAME}:address:${address}`, limit: this.limits.address };
    if (account === null) return [{ ...perAddress, limit: this.limits.account }];
    return [
      { key: `${THROTTLER_NAME}:account:${account}|${address}`, limit: this.limits.account },
      perAddress,
    ];
  }

  private tooMany(): ThrottlerException {
    return new ThrottlerException('Too many failed sign-ins; wait a minute and try again');
  }
}
