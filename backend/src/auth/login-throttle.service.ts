import { Inject, Injectable } from '@nestjs/common';
import { ThrottlerException, ThrottlerStorage, ThrottlerStorageService } from '@nestjs/throttler';

export const LOGIN_FAILURE_LIMIT = 10;
export const LOGIN_FAILURE_WINDOW_MS = 60_000;
const THROTTLER_NAME = 'login-failures';

/**
 * Counts failed sign-ins per client in @nestjs/throttler's storage. The stock ThrottlerGuard
 * counts every request, successful or not; the rule here is about failures: more than
 * LOGIN_FAILURE_LIMIT in a minute from one client gets 429 until the minute is over.
 */
@Injectable()
export class LoginThrottleService {
  constructor(@Inject(ThrottlerStorage) private readonly storage: ThrottlerStorageService) {}

  /** Refuses a client that is blocked, before its password is even checked. */
  assertNotBlocked(client: string): void {
    const record = this.storage.storage.get(this.key(client));
    if (record?.isBlocked && record.blockExpiresAt > Date.now()) {
      throw this.tooMany();
    }
  }

  /** Records one failure; the failure that passes the limit is itself answered with 429. */
  async recordFailure(client: string): Promise<void> {
    const record = await this.storage.increment(
      this.key(client),
      LOGIN_FAILURE_WINDOW_MS,
      LOGIN_FAILURE_LIMIT,
      LOGIN_FAILURE_WINDOW_MS,
      THROTTLER_NAME,
    );
    if (record.isBlocked) throw this.tooMany();
  }

  private key(client: string): string {
    return `${THROTTLER_NAME}:${client}`;
  }

  private tooMany(): ThrottlerException {
    return new ThrottlerException(
      'Too many failed sign-ins from here; wait a minute and try again',
    );
  }
}
