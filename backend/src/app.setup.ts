import { type INestApplication, ValidationPipe } from '@nestjs/common';
import helmet from 'helmet';
import { ApiExceptionFilter } from './common/filters/api-exception.filter';

/** What main.ts and the e2e tests both apply to the app, so tests see what users get. */
export function configureApp(app: INestApplication): INestApplication {
  app.setGlobalPrefix('api');
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
    }),
  );
  app.useGlobalFilters(new ApiExceptionFilter());
  app.enableShutdownHooks();
  return app;
}
