import { Body, Controller, Get, HttpCode, Patch, Post, Req, Res, UseGuards } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  changePasswordSchema,
  completePasswordResetSchema,
  signInSchema,
  updateMeSchema,
  type ChangePasswordInput,
  type CompletePasswordResetInput,
  type Session,
  type SignInInput,
  type UpdateMeInput,
  type User,
  apiRoutes,
} from '@holdfast/shared';
import type { Request, Response } from 'express';
import { AppConfig } from '../config/app-config.js';
import { ApiBodySchema } from '../common/openapi.js';
import { ZodValidationPipe } from '../common/pipes/zod-validation.pipe.js';
import { UsersService } from '../users/users.service.js';
import { REFRESH_COOKIE, REFRESH_COOKIE_PATH } from './access-token.js';
import { CurrentUser, type AuthUser } from './auth-user.js';
import { AuthService, type IssuedSession } from './auth.service.js';
import { LoginThrottlerGuard } from './login-throttler.guard.js';
import { PasswordResetService } from './password-reset.service.js';
import { Public, SignedIn } from './policy.js';

@ApiTags('auth')
@Controller()
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly users: UsersService,
    private readonly config: AppConfig,
    private readonly resets: PasswordResetService,
  ) {}

  @Post(apiRoutes.auth.signIn.path)
  @Public()
  @UseGuards(LoginThrottlerGuard)
  @HttpCode(200)
  @ApiBodySchema(signInSchema)
  async signIn(
    @Body(new ZodValidationPipe(signInSchema)) input: SignInInput,
    @Res({ passthrough: true }) res: Response,
  ): Promise<Session> {
    return this.withCookie(res, await this.auth.signIn(input));
  }

  @Post(apiRoutes.auth.refresh.path)
  @Public()
  @HttpCode(200)
  async refresh(@Req() req: Request, @Res({ passthrough: true }) res: Response): Promise<Session> {
    return this.withCookie(res, await this.auth.refresh(this.cookie(req)));
  }

  @Post(apiRoutes.auth.signOut.path)
  @Public()
  @HttpCode(204)
  async signOut(@Req() req: Request, @Res({ passthrough: true }) res: Response): Promise<void> {
    await this.auth.signOut(this.cookie(req));
    res.clearCookie(REFRESH_COOKIE, this.cookieOptions());
  }

  @Get(apiRoutes.auth.me.path)
  @SignedIn()
  @ApiBearerAuth()
  me(@CurrentUser() user: AuthUser): User {
    return user;
  }

  @Patch(apiRoutes.auth.updateMe.path)
  @SignedIn()
  @ApiBearerAuth()
  @ApiBodySchema(updateMeSchema)
  updateMe(
    @CurrentUser() user: AuthUser,
    @Body(new ZodValidationPipe(updateMeSchema)) input: UpdateMeInput,
  ): Promise<User> {
    return this.users.updatePreferences(user.id, input);
  }

  /** Change one's own password; other sessions end, this one continues with a new cookie. */
  @Post(apiRoutes.auth.changePassword.path)
  @SignedIn()
  @HttpCode(200)
  @ApiBearerAuth()
  @ApiBodySchema(changePasswordSchema)
  async changePassword(
    @CurrentUser() user: AuthUser,
    @Body(new ZodValidationPipe(changePasswordSchema)) input: ChangePasswordInput,
    @Res({ passthrough: true }) res: Response,
  ): Promise<Session> {
    return this.withCookie(res, await this.auth.changePassword(user.id, input));
  }

  /** Set a new password with the one-time token from an admin reset mail. */
  @Post(apiRoutes.auth.completePasswordReset.path)
  @Public()
  @UseGuards(LoginThrottlerGuard)
  @HttpCode(204)
  @ApiBodySchema(completePasswordResetSchema)
  async completeReset(
    @Body(new ZodValidationPipe(completePasswordResetSchema)) input: CompletePasswordResetInput,
  ): Promise<void> {
    await this.resets.complete(input);
  }

  private cookie(req: Request): string | undefined {
    const value = (req.cookies as Record<string, unknown> | undefined)?.[REFRESH_COOKIE];
    return typeof value === 'string' && value.length > 0 ? value : undefined;
  }

  private cookieOptions() {
    return {
      httpOnly: true,
      sameSite: 'strict' as const,
      secure: this.config.secureCookies,
      path: REFRESH_COOKIE_PATH,
    };
  }

  private withCookie(res: Response, issued: IssuedSession): Session {
    res.cookie(REFRESH_COOKIE, issued.refreshToken, {
      ...this.cookieOptions(),
      expires: issued.refreshExpiresAt,
    });
    return issued.session;
  }
}
