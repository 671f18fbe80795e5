import { Body, Controller, Get, HttpCode, Patch, Post, Req, Res, UseGuards } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import {
  passwordResetRequestSchema,
  passwordResetSchema,
  profileUpdateSchema,
  registerSchema,
  signInSchema,
  type PasswordResetInput,
  type PasswordResetRequestInput,
  type ProfileUpdate,
  type RegisterInput,
  type SignInInput,
} from '@mixmark/common';
import type { Request, Response } from 'express';
import { CurrentUser, type AuthUser } from '../common/decorators/current-user.decorator';
import { Public } from '../common/decorators/public.decorator';
import { SchemaValidationPipe } from '../common/pipes/schema-validation.pipe';
import type { AllConfigType } from '../config/config.type';
import { toProfile, UsersService, type Profile, type PublicUser } from '../users/users.service';
import { AuthService, type Session } from './auth.service';
import { SignInRateLimitGuard } from './guards/sign-in-rate-limit.guard';
import { PasswordResetsService } from './password-resets.service';

export const REFRESH_COOKIE = 'mixmark_refresh';
/**
 * Set and cleared with the refresh cookie, readable by the page and holding nothing but "1": it
 * tells the web app whether a session may be restored, so that a visitor who is not signed in
 * does not send a refresh request bound to fail on every page load.
 */
export const SESSION_HINT_COOKIE = 'mixmark_session';

/** What a session reply carries in its body; the refresh token goes only in the cookie. */
export interface SessionReply {
  accessToken: string;
  expiresIn: number;
  user: PublicUser;
}

@Controller('auth')
export class AuthController {
  constructor(
    private readonly authService: AuthService,
    private readonly usersService: UsersService,
    private readonly passwordResetsService: PasswordResetsService,
    private readonly configService: ConfigService<AllConfigType>,
  ) {}

  @Public()
  @Post('register')
  async register(
    @Body(new SchemaValidationPipe(registerSchema)) body: RegisterInput,
    @Res({ passthrough: true }) response: Response,
  ): Promise<SessionReply> {
    return this.reply(await this.authService.register(body), response);
  }

  @Public()
  @UseGuards(SignInRateLimitGuard)
  @Post('sign-in')
  @HttpCode(200)
  async signIn(
    @Body(new SchemaValidationPipe(signInSchema)) body: SignInInput,
    @Res({ passthrough: true }) response: Response,
  ): Promise<SessionReply> {
    return this.reply(await this.authService.signIn(body), response);
  }

  @Public()
  @Post('refresh')
  @HttpCode(200)
  async refresh(@Req() request: Request, @Res({ passthrough: true }) response: Response): Promise<SessionReply> {
    try {
      return this.reply(await this.authService.refresh(request.cookies?.[REFRESH_COOKIE]), response);
    } catch (error) {
      this.clearCookie(response);
      throw error;
    }
  }

  @Public()
  @Post('sign-out')
  @HttpCode(204)
  async signOut(@Req() request: Request, @Res({ passthrough: true }) response: Response): Promise<void> {
    await this.authService.signOut(request.cookies?.[REFRESH_COOKIE]);
    this.clearCookie(response);
  }

  /** Always 202: the reply does not tell whether the address has an account. */
  @Public()
  @UseGuards(SignInRateLimitGuard)
  @Post('password-reset/request')
  @HttpCode(202)
  async requestPasswordReset(@Body(new SchemaValidationPipe(passwordResetRequestSchema)) body: PasswordResetRequestInput): Promise<{ message: string }> {
    await this.passwordResetsService.request(body.email);
    return { message: 'If an account uses this address, a reset link is on its way. It works once and expires soon.' };
  }

  @Public()
  @Post('password-reset')
  @HttpCode(204)
  async resetPassword(@Body(new SchemaValidationPipe(passwordResetSchema)) body: PasswordResetInput): Promise<void> {
    await this.passwordResetsService.reset(body.token, body.password);
  }

  /** The signed-in person, with their own settings (`weeklyDigest`). */
  @Get('me')
  async me(@CurrentUser() caller: AuthUser): Promise<Profile> {
    return toProfile(await this.usersService.findOne(caller.id));
  }

  /** Changes the signed-in person's display name and/or weekly digest choice; answers as `GET me`. */
  @Patch('me')
  async updateMe(
    @CurrentUser() caller: AuthUser,
    @Body(new SchemaValidationPipe(profileUpdateSchema)) body: ProfileUpdate,
  ): Promise<Profile> {
    return toProfile(await this.usersService.updateProfile(caller.id, body));
  }

  private reply(session: Session, response: Response): SessionReply {
    response.cookie(REFRESH_COOKIE, session.refreshToken, {
      ...this.cookieOptions(),
      expires: session.refreshExpiresAt,
    });
    response.cookie(SESSION_HINT_COOKIE, '1', { ...this.hintCookieOptions(), expires: session.refreshExpiresAt });
    return { accessToken: session.accessToken, expiresIn: session.expiresIn, user: session.user };
  }

  private clearCookie(response: Response): void {
    response.clearCookie(REFRESH_COOKIE, this.cookieOptions());
    response.clearCookie(SESSION_HINT_COOKIE, this.hintCookieOptions());
  }

  private hintCookieOptions() {
    return { ...this.cookieOptions(), httpOnly: false, path: '/' };
  }

  private cookieOptions() {
    const publicUrl = this.configService.getOrThrow('app.publicUrl', { infer: true });
    return { httpOnly: true, sameSite: 'strict' as const, secure: publicUrl.startsWith('https:'), path: '/api/auth' };
  }
}
