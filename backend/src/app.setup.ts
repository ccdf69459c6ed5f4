import { BadRequestException, ValidationPipe } from '@nestjs/common';
import type { NestExpressApplication } from '@nestjs/platform-express';
import compression from 'compression';
import helmet from 'helmet';
import { constants as zlibConstants } from 'node:zlib';
import type { NextFunction, Request, Response } from 'express';
import { ApiExceptionFilter, errorBody } from './common/filters/api-exception.filter';
import { RefusedFieldError } from './common/validation/refused-field-error';
import { ControlCharactersPipe } from './common/validation/control-characters.pipe';
import { formatValidationErrors } from './common/validation/format-validation-errors';
import { setupOpenApi } from './openapi/openapi';

/** What main.ts and the e2e tests both apply to the app, so tests see what users get. */
export function configureApp(app: NestExpressApplication): NestExpressApplication {
  app.setGlobalPrefix('api');
  // Answers and static files compressed when the client asks: brotli (at quality 4, which is
  // fast enough for answers made per request) or gzip. Registered first, so it wraps them all.
  app.use(
    compression({
      brotli: { params: { [zlibConstants.BROTLI_PARAM_QUALITY]: 4 } },
      threshold: 1024,
    }),
  );
  // Source maps are built for debugging here and never served.
  app.use(refuseSourceMaps);
  // No ETag on API answers: hashing a large analysis answer for it cost more than the answer was
  // worth, and every answer is made fresh. Static files keep theirs (serve-static's own).
  app.set('etag', false);
  // Keys that could reach an object's prototype are refused while the JSON is parsed. Both
  // parsers are set here, so Nest adds none of its own after the error handler below.
  app.useBodyParser('json', { reviver: refusePrototypeKeys, limit: JSON_BODY_LIMIT });
  app.useBodyParser('urlencoded', { extended: false, limit: '100kb' });
  // A body that cannot be parsed is answered here, in the API's error shape. Left to Express,
  // the web app's static-file handler would answer it "404 Cannot POST".
  app.use(answerBodyParserErrors);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // MUI (Emotion) writes its styles into <style> tags at run time.
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
        },
      },
    }),
  );
  app.useGlobalPipes(
    new ControlCharactersPipe(),
    new ValidationPipe({
      whitelist: true,
      forbidNonWhitelisted: true,
      transform: true,
      validationError: { target: false, value: false },
      exceptionFactory: (errors) => new BadRequestException(formatValidationErrors(errors)),
    }),
  );
  app.useGlobalFilters(new ApiExceptionFilter());
  setupOpenApi(app);
  app.enableShutdownHooks();
  return app;
}

/**
 * The largest request the API accepts is a ground-motion record of 60,000 samples written at full
 * precision (about 1.4 MB, in a response history request or a calc's PATCH); 4 MB leaves room
 * for indented JSON. (The largest analysis request, 500 labelled storeys with every option, is
 * about 200 KB.)
 */
export const JSON_BODY_LIMIT = 4 * 1024 * 1024;

const PROTOTYPE_KEYS = new Set(['__proto__', 'constructor', 'prototype']);

function refusePrototypeKeys(key: string, value: unknown): unknown {
  if (PROTOTYPE_KEYS.has(key)) throw new RefusedFieldError(key);
  return value;
}

function refuseSourceMaps(request: Request, response: Response, next: NextFunction): void {
  if (request.path.endsWith('.map') && !request.path.startsWith('/api/')) {
    response.status(404).json({ statusCode: 404, message: ['Not found'], error: 'Not Found' });
    return;
  }
  next();
}

function answerBodyParserErrors(
  error: unknown,
  _request: Request,
  response: Response,
  next: NextFunction,
): void {
  if (response.headersSent) return next(error);
  const body = errorBody(error);
  response.status(body.statusCode).json(body);
}
