import { Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { ThrottlerModule } from '@nestjs/throttler';
import type { AppEnvironment } from '../config/environment';
import { AuthController } from './auth.controller';
import { AuthService } from './auth.service';
import { JWT_ALGORITHM, JWT_AUDIENCE, JWT_ISSUER, JWT_LIFETIME_SECONDS } from './jwt-claims';
import { JwtStrategy } from './jwt.strategy';
import { SignedInUsers } from './signed-in-users';
import {
  LOGIN_FAILURE_LIMIT,
  LOGIN_FAILURE_WINDOW_MS,
  LoginThrottleService,
} from './login-throttle.service';

@Module({
  imports: [
    PassportModule,
    // Only its storage is used, by LoginThrottleService; no route carries the stock guard.
    ThrottlerModule.forRoot([
      { name: 'login-failures', ttl: LOGIN_FAILURE_WINDOW_MS, limit: LOGIN_FAILURE_LIMIT },
    ]),
    JwtModule.registerAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<AppEnvironment, true>) => ({
        secret: config.get('jwtSecret', { infer: true }),
        signOptions: {
          algorithm: JWT_ALGORITHM,
          expiresIn: JWT_LIFETIME_SECONDS,
          issuer: JWT_ISSUER,
          audience: JWT_AUDIENCE,
        },
        verifyOptions: { algorithms: [JWT_ALGORITHM], issuer: JWT_ISSUER, audience: JWT_AUDIENCE },
      }),
    }),
  ],
  controllers: [AuthController],
  providers: [AuthService, JwtStrategy, LoginThrottleService, SignedInUsers],
})
export class AuthModule {}
