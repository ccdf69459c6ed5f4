import { BadRequestException, ValidationPipe } from '@nestjs/common';
import type { NestExpressApplication } from '@nestjs/platform-express';
import helmet from 'helmet';
import { ApiExceptionFilter } from './common/filters/api-exception.filter';
import { formatValidationErrors } from './common/validation/format-validation-errors';
import { setupOpenApi } from './openapi/openapi';

/** What main.ts and the e2e tests both apply to the app, so tests see what users get. */
export function configureApp(app: NestExpressApplication): NestExpressApplication {
  app.setGlobalPrefix('api');
  // Keys that could reach an object's prototype are refused while the JSON is parsed.
  app.useBodyParser('json', { reviver: refusePrototypeKeys });
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

const PROTOTYPE_KEYS = new Set(['__proto__', 'constructor', 'prototype']);

function refusePrototypeKeys(key: string, value: unknown): unknown {
  if (PROTOTYPE_KEYS.has(key)) {
    throw new SyntaxError(`The request has a field named "${key}", which is not allowed`);
  }
  return value;
}
