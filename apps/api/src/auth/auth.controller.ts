import { Body, Controller, Get, Headers, HttpCode, Ip, Post, Res } from '@nestjs/common';
import {
  ApiForbiddenResponse,
  ApiGoneResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
  ApiTooManyRequestsResponse,
  ApiUnauthorizedResponse,
  ApiUnprocessableEntityResponse,
} from '@nestjs/swagger';
import { Throttle } from '@nestjs/throttler';
import type { Response } from 'express';
import { readAuthConfig } from '../config/auth.config';
import type { AuthUser } from '../common/auth-user';
import { AuthService } from './auth.service';
import { Public, SignedIn } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { AccountNoticeDto, LoginResponseDto, PublicUserDto, SessionsEndedDto } from './dto/auth-answers.dto';
import { LoginDto } from './dto/login.dto';
import { PasswordChangeDto, PasswordResetConfirmDto, PasswordResetRequestDto } from './dto/password.dto';
import { SessionsService } from './sessions.service';

const LOCKED = 'Sign-in locked for this account or address after repeated failures; the message says until when, Retry-After how many seconds.';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly sessions: SessionsService,
  ) {}

  @Post('login')
  @Public()
  // Every attempt counts here, right or wrong; SignInLockoutService separately locks after repeated failures.
  @Throttle({ default: { limit: () => readAuthConfig().loginAttemptsPerMinute, ttl: 60_000 } })
  @HttpCode(200)
  @ApiOperation({
    summary: 'Sign in: answers a short-lived bearer token for API clients and sets the httpOnly session cookie browsers use',
  })
  @ApiOkResponse({ type: LoginResponseDto })
  @ApiUnauthorizedResponse({ description: 'Wrong e-mail or password (the same answer for both), or a deactivated account.' })
  @ApiTooManyRequestsResponse({ description: LOCKED })
  async login(@Body() body: LoginDto, @Ip() address: string, @Headers('user-agent') userAgent: string | undefined, @Res({ passthrough: true }) response: Response) {
    const { started, answer } = await this.auth.login(body.email, body.password, { address, userAgent });
    this.sessions.setCookie(response, started);
    return answer;
  }

  @Get('me')
  @SignedIn()
  @ApiOkResponse({ type: PublicUserDto, description: 'The signed-in person, with their locale and e-mail preferences.' })
  me(@CurrentUser() user: AuthUser) {
    return this.auth.me(user.id);
  }

  @Post('logout')
  @SignedIn()
  @HttpCode(200)
  @ApiOperation({ summary: 'Sign out: ends this session (its token and cookie stop working)' })
  @ApiOkResponse({ type: AccountNoticeDto })
  async logout(@CurrentUser() user: AuthUser, @Res({ passthrough: true }) response: Response) {
    this.sessions.clearCookie(response);
    return this.auth.logout(user);
  }

  @Post('logout-all')
  @SignedIn()
  @HttpCode(200)
  @ApiOperation({ summary: 'Sign out everywhere: ends every session of the account, this one included' })
  @ApiOkResponse({ type: SessionsEndedDto })
  async logoutAll(@CurrentUser() user: AuthUser, @Res({ passthrough: true }) response: Response) {
    this.sessions.clearCookie(response);
    return this.auth.logoutEverywhere(user);
  }

  @Post('password')
  @SignedIn()
  @HttpCode(200)
  @ApiOperation({ summary: 'Change one’s own password (the current one is required); every other session ends' })
  @ApiOkResponse({ type: AccountNoticeDto })
  @ApiForbiddenResponse({ description: 'The current password is not right.' })
  @ApiUnprocessableEntityResponse({ description: 'The new password is too short, too long, common, or one’s own name or e-mail (a sentence).' })
  @ApiTooManyRequestsResponse({ description: LOCKED })
  changePassword(@CurrentUser() user: AuthUser, @Body() body: PasswordChangeDto, @Ip() address: string) {
    return this.auth.changePassword(user, body.currentPassword, body.newPassword, { address });
  }

  @Post('password-reset')
  @Public()
  @Throttle({ default: { limit: () => readAuthConfig().loginAttemptsPerMinute, ttl: 60_000 } })
  @HttpCode(200)
  @ApiOperation({ summary: 'Forgotten password: e-mails a single-use link APP_URL/reset-password/<token>; the same answer for any address' })
  @ApiOkResponse({ type: AccountNoticeDto })
  requestReset(@Body() body: PasswordResetRequestDto) {
    return this.auth.requestReset(body.email);
  }

  @Post('password-reset/confirm')
  @Public()
  @Throttle({ default: { limit: () => readAuthConfig().loginAttemptsPerMinute, ttl: 60_000 } })
  @HttpCode(200)
  @ApiOperation({ summary: 'Set a new password from the e-mailed link; every session of the account ends' })
  @ApiOkResponse({ type: AccountNoticeDto })
  @ApiNotFoundResponse({ description: 'No reset link has this token.' })
  @ApiGoneResponse({ description: 'The link was already used or has expired.' })
  @ApiUnprocessableEntityResponse({ description: 'The new password does not meet the rules (a sentence).' })
  confirmReset(@Body() body: PasswordResetConfirmDto) {
    return this.auth.confirmReset(body.token, body.password);
  }
}
