import { Body, Controller, Get, HttpCode, Ip, Post } from '@nestjs/common';
import { ApiOkResponse, ApiTags, ApiTooManyRequestsResponse, ApiUnauthorizedResponse } from '@nestjs/swagger';
import { Throttle } from '@nestjs/throttler';
import { readAuthConfig } from '../config/auth.config';
import type { AuthUser } from './auth-user';
import { AuthService } from './auth.service';
import { Public, SignedIn } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { LoginDto } from './dto/login.dto';
import { PublicUserDto } from '../users/dto/public-user.dto';
import { LoginResponseDto } from './dto/login-response.dto';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(private readonly auth: AuthService) {}

  @Post('login')
  @Public()
  // Every attempt counts here, right or wrong; LoginAttemptsService separately refuses after repeated failures.
  @Throttle({ default: { limit: () => readAuthConfig().loginAttemptsPerMinute, ttl: 60_000 } })
  @HttpCode(200)
  @ApiOkResponse({ type: LoginResponseDto, description: 'A bearer token and the signed-in person.' })
  @ApiUnauthorizedResponse({ description: 'Wrong e-mail or password (the same answer for both).' })
  @ApiTooManyRequestsResponse({ description: 'Too many failed attempts from this address within the window.' })
  login(@Body() body: LoginDto, @Ip() address: string) {
    return this.auth.login(body.email, body.password, address);
  }

  @Get('me')
  @SignedIn()
  @ApiOkResponse({ type: PublicUserDto, description: 'The signed-in person.' })
  me(@CurrentUser() user: AuthUser) {
    return this.auth.me(user.id);
  }
}
