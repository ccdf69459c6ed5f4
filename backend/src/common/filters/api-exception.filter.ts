import { ForbiddenError } from '@casl/ability';
import {
  DriverException,
  ForeignKeyConstraintViolationException,
  NotFoundError,
  NotNullConstraintViolationException,
  OptimisticLockError,
  UniqueConstraintViolationException,
} from '@mikro-orm/core';
import {
  ArgumentsHost,
  Catch,
  ExceptionFilter,
  HttpException,
  HttpStatus,
  Logger,
} from '@nestjs/common';
import type { ApiErrorBody } from '@tiermode/shared-types';
import type { Response } from 'express';
import { RefusedFieldError } from '../validation/refused-field-error';

/**
 * Every error leaves as `{ statusCode, message: string[], error }`. Authorization, ORM and
 * body-parser errors get their proper 4xx; anything unexpected is logged and answered with a
 * plain 500 that reveals nothing of the internals.
 */
@Catch()
export class ApiExceptionFilter implements ExceptionFilter {
  catch(exception: unknown, host: ArgumentsHost): void {
    const response = host.switchToHttp().getResponse<Response>();
    const body = errorBody(exception);
    response.status(body.statusCode).json(body);
  }
}

const logger = new Logger('Exceptions');

/**
 * The answer to any error: used by the filter for errors in routes, and by the body-parser
 * error handler (app.setup.ts) for errors raised before a route is reached.
 */
export function errorBody(exception: unknown): ApiErrorBody {
  const { statusCode, message } = describe(exception);
  return {
    // Anything else the thrower put beside the message (an upload's preview rows, say).
    ...extraFields(exception),
    statusCode,
    message: Array.isArray(message) ? message : [message],
    error: httpStatusName(statusCode),
  };
}

function describe(exception: unknown): { statusCode: number; message: string | string[] } {
  if (exception instanceof HttpException) {
    const payload = exception.getResponse();
    const message =
      typeof payload === 'string'
        ? payload
        : ((payload as { message?: string | string[] }).message ?? exception.message);
    return { statusCode: exception.getStatus(), message };
  }
  if (exception instanceof ForbiddenError) {
    return { statusCode: HttpStatus.FORBIDDEN, message: exception.message };
  }
  if (exception instanceof OptimisticLockError) {
    return {
      statusCode: HttpStatus.CONFLICT,
      message: 'This record was changed by someone else; reload and try again',
    };
  }
  if (exception instanceof UniqueConstraintViolationException) {
    return {
      statusCode: HttpStatus.CONFLICT,
      message: 'A record with these values already exists',
    };
  }
  if (exception instanceof ForeignKeyConstraintViolationException) {
    // Services check what depends on a record before deleting it; this is the second line.
    return {
      statusCode: HttpStatus.CONFLICT,
      message: 'Other records still refer to this one, so it cannot be removed',
    };
  }
  if (exception instanceof NotNullConstraintViolationException) {
    // Validation should have refused the request; say so in the log, and answer as bad input.
    logger.error(`A request reached the database without a required value: ${exception.message}`);
    return { statusCode: HttpStatus.BAD_REQUEST, message: 'A required value is missing' };
  }
  if (exception instanceof NotFoundError) {
    return { statusCode: HttpStatus.NOT_FOUND, message: 'Not found' };
  }
  const clientError = asClientHttpError(exception);
  if (clientError) return clientError;
  // A database error's message holds the SQL and its values (a password hash, say): log only
  // the driver's own reason.
  logger.error(
    exception instanceof DriverException
      ? `${exception.name}: ${driverReason(exception)}`
      : exception instanceof Error
        ? (exception.stack ?? exception.message)
        : String(exception),
  );
  return { statusCode: HttpStatus.INTERNAL_SERVER_ERROR, message: 'Internal server error' };
}

/** The fields of an HttpException's payload other than the standard three. */
function extraFields(exception: unknown): Record<string, unknown> {
  if (!(exception instanceof HttpException)) return {};
  const payload = exception.getResponse();
  if (typeof payload !== 'object' || payload === null) return {};
  return Object.fromEntries(
    Object.entries(payload).filter(([key]) => !['statusCode', 'message', 'error'].includes(key)),
  );
}

/**
 * body-parser and multer raise http-errors with a 4xx `status` and a `type`. Each is answered
 * with a message that says what to send instead; an unreadable body is bad input (400), a body
 * over the limit is 413.
 */
function asClientHttpError(exception: unknown): { statusCode: number; message: string } | null {
  if (typeof exception !== 'object' || exception === null) return null;
  const { status, expose, type, charset, message, limit } = exception as {
    status?: unknown;
    expose?: unknown;
    type?: unknown;
    charset?: unknown;
    message?: unknown;
    limit?: unknown;
  };
  if (typeof status !== 'number' || status < 400 || status > 499 || expose !== true) return null;
  switch (type) {
    case 'entity.too.large':
      return {
        statusCode: HttpStatus.PAYLOAD_TOO_LARGE,
        message:
          typeof limit === 'number'
            ? `The request body is too large (the limit is ${Math.round(limit / 1024)} KB)`
            : 'The request body is too large',
      };
    case 'entity.parse.failed':
      if (exception instanceof RefusedFieldError) {
        return { statusCode: HttpStatus.BAD_REQUEST, message: exception.message };
      }
      return {
        statusCode: HttpStatus.BAD_REQUEST,
        message: `The request body is not valid JSON: ${typeof message === 'string' ? message : 'it could not be parsed'}`,
      };
    case 'charset.unsupported':
      return {
        statusCode: HttpStatus.BAD_REQUEST,
        message: `The request body's charset "${String(charset)}" is not supported; send UTF-8`,
      };
    case 'encoding.unsupported':
      return {
        statusCode: HttpStatus.BAD_REQUEST,
        message:
          "The request body's content encoding is not supported; send it uncompressed or as gzip",
      };
    default:
      return {
        statusCode: status === 413 ? HttpStatus.PAYLOAD_TOO_LARGE : HttpStatus.BAD_REQUEST,
        message: 'The request body could not be read',
      };
  }
}

function httpStatusName(statusCode: number): string {
  const name = HttpStatus[statusCode];
  return typeof name === 'string'
    ? name
        .toLowerCase()
        .split('_')
        .map((w) => w[0].toUpperCase() + w.slice(1))
        .join(' ')
    : 'Error';
}

/** "SQLITE_CONSTRAINT: NOT NULL constraint failed: calculations.title", without the query. */
function driverReason(exception: DriverException): string {
  const at = exception.message.lastIndexOf(' - ');
  return at >= 0 ? exception.message.slice(at + 3) : (exception.code ?? 'database error');
}
