import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { APP_GUARD } from '@nestjs/core';
import { ServeStaticModule } from '@nestjs/serve-static';
import { AnalysisModule } from './analysis/analysis.module';
import { AuthModule } from './auth/auth.module';
import { CalculationsModule } from './calculations/calculations.module';
import { JwtAuthGuard } from './auth/jwt-auth.guard';
import { AuthorizationModule } from './authorization/authorization.module';
import { PoliciesGuard } from './authorization/policies.guard';
import { loadEnvironment } from './config/environment';
import { FRONTEND_DIST } from './config/paths';
import { DatabaseModule } from './database/database.module';
import { ExportsModule } from './exports/exports.module';
import { HealthModule } from './health/health.module';
import { ImportsModule } from './imports/imports.module';
import { MailModule } from './mail/mail.module';
import { ProjectsModule } from './projects/projects.module';
import { RateLimitModule } from './rate-limit/rate-limit.module';
import { ReportsModule } from './reports/reports.module';
import { SigningModule } from './signing/signing.module';
import { UsersModule } from './users/users.module';
import { VerificationModule } from './verification/verification.module';

/**
 * Vite names every built asset by its content's hash (assets/index-3f9a1c.js): such a file never
 * changes, so browsers may keep it for a year. Anything else (index.html) is checked each time.
 */
function cacheHeaders(
  response: { setHeader: (name: string, value: string) => void },
  path: string,
) {
  response.setHeader(
    'Cache-Control',
    /[\\/]assets[\\/][^\\/]+-[A-Za-z0-9_-]{8,}\.[a-z0-9]+$/.test(path)
      ? 'public, max-age=31536000, immutable'
      : 'no-cache',
  );
}

// The built web app, when there is one; every non-API path gets index.html (client routing).
const webApp = existsSync(join(FRONTEND_DIST, 'index.html'))
  ? [
      ServeStaticModule.forRoot({
        rootPath: FRONTEND_DIST,
        exclude: ['/api{/*path}'],
        serveStaticOptions: { setHeaders: cacheHeaders },
      }),
    ]
  : [];

@Module({
  imports: [
    ConfigModule.forRoot({ isGlobal: true, ignoreEnvFile: true, validate: loadEnvironment }),
    DatabaseModule,
    AuthorizationModule,
    AuthModule,
    UsersModule,
    ProjectsModule,
    CalculationsModule,
    AnalysisModule,
    ImportsModule,
    ExportsModule,
    ReportsModule,
    VerificationModule,
    HealthModule,
    MailModule,
    RateLimitModule,
    SigningModule,
    ...webApp,
  ],
  providers: [
    // Order matters: first who you are, then what you may do.
    { provide: APP_GUARD, useClass: JwtAuthGuard },
    { provide: APP_GUARD, useClass: PoliciesGuard },
  ],
})
export class AppModule {}
