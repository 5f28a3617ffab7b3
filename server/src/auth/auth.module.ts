import { createSecretKey } from 'node:crypto';
import { Module, type ExecutionContext } from '@nestjs/common';
import type { Request } from 'express';
import { APP_GUARD } from '@nestjs/core';
import { JwtModule } from '@nestjs/jwt';
import { ThrottlerModule } from '@nestjs/throttler';
import { AppConfig } from '../config/app-config.js';
import { UsersModule } from '../users/users.module.js';
import { ACCESS_TOKEN_SECONDS } from './access-token.js';
import { AccessVerifier } from './access-verifier.js';
import { AuthController } from './auth.controller.js';
import { AuthGuard } from './auth.guard.js';
import { AuthService } from './auth.service.js';
import { LoginThrottlerGuard } from './login-throttler.guard.js';
import { PasswordResetService } from './password-reset.service.js';
import { PasswordResetsRepository } from './password-resets.repository.js';
import { RefreshTokensRepository } from './refresh-tokens.repository.js';
import { UserPasswordController } from './user-password.controller.js';

/** The per-address counter is for sign-in and reset only, not for routes that reuse the guard. */
const isNotAuthRoute = (context: ExecutionContext) =>
  !context.switchToHttp().getRequest<Request>().originalUrl.startsWith('/api/auth/');

@Module({
  imports: [
    UsersModule,
    JwtModule.registerAsync({
      inject: [AppConfig],
      useFactory: (config: AppConfig) => ({
        // A key object, not the string: jsonwebtoken first tries a string as a PEM public key
        // and catches the failure, on every sign and verify (about 15 % of a signed-in request).
        secret: createSecretKey(Buffer.from(config.settings.JWT_SECRET)),
        signOptions: { algorithm: 'HS256', expiresIn: ACCESS_TOKEN_SECONDS },
        verifyOptions: { algorithms: ['HS256'] },
      }),
    }),
    ThrottlerModule.forRootAsync({
      inject: [AppConfig],
      useFactory: (config: AppConfig) => [
        {
          name: 'login',
          ttl: config.settings.LOGIN_THROTTLE_TTL_SECONDS * 1000,
          limit: config.settings.LOGIN_THROTTLE_LIMIT,
        },
        // Per client address whatever the e-mail, so one address cannot spray many accounts.
        {
          name: 'login-ip',
          ttl: config.settings.LOGIN_THROTTLE_TTL_SECONDS * 1000,
          limit: config.settings.LOGIN_THROTTLE_IP_LIMIT,
          getTracker: (req: Record<string, unknown>) => `ip|${String(req.ip)}`,
          skipIf: isNotAuthRoute,
        },
      ],
    }),
  ],
  controllers: [AuthController, UserPasswordController],
  providers: [
    AuthService,
    AccessVerifier,
    PasswordResetService,
    PasswordResetsRepository,
    RefreshTokensRepository,
    LoginThrottlerGuard,
    { provide: APP_GUARD, useClass: AuthGuard },
  ],
  exports: [AccessVerifier],
})
export class AuthModule {}
