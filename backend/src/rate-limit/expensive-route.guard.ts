import {
  HttpException,
  HttpStatus,
  Inject,
  Injectable,
  type CanActivate,
  type ExecutionContext,
} from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { ThrottlerStorage } from '@nestjs/throttler';
import type { Response } from 'express';
import type { AuthenticatedRequest } from '../authorization/authenticated-request';
import type { AppEnvironment } from '../config/environment';

export const EXPENSIVE_WINDOW_MS = 60_000;
const THROTTLER_NAME = 'expensive';

/**
 * Counts each signed-in person's expensive requests (analyses, checks, spectra, imports, calc
 * packages) in @nestjs/throttler's storage and answers 429 past the limit a minute, with
 * Retry-After. Per person, not per address, so an office behind one router shares nothing.
 * Runs after the global guards, so the user is known.
 */
@Injectable()
export class ExpensiveRouteGuard implements CanActivate {
  constructor(
    @Inject(ThrottlerStorage) private readonly storage: ThrottlerStorage,
    private readonly config: ConfigService<AppEnvironment, true>,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const http = context.switchToHttp();
    const request = http.getRequest<AuthenticatedRequest>();
    const response = http.getResponse<Response>();
    const limit = this.config.get('expensiveRequestsPerMinute', { infer: true });
    const who = request.user?.id ?? `address:${request.ip ?? 'unknown'}`;
    const record = await this.storage.increment(
      `${THROTTLER_NAME}:${who}`,
      EXPENSIVE_WINDOW_MS,
      limit,
      EXPENSIVE_WINDOW_MS,
      THROTTLER_NAME,
    );
    if (!record.isBlocked) return true;
    const wait = Math.max(1, Math.ceil(record.timeToBlockExpire));
    response.setHeader('Retry-After', String(wait));
    throw new HttpException(
      `Too many analyses, checks, spectra, imports or calc packages: at most ${limit} a minute for each person. Wait ${wait} s and try again`,
      HttpStatus.TOO_MANY_REQUESTS,
    );
  }
}
