import { Body, Controller, Get, HttpCode, Param, ParseIntPipe, Post } from '@nestjs/common';
import { ApiConflictResponse, ApiCreatedResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user';
import { AdminOnly } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { CreateUserDto } from './dto/create-user.dto';
import { UsersService } from './users.service';
import { PublicUserDto } from './dto/public-user.dto';

@ApiTags('users')
@Controller('users')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  @AdminOnly()
  @ApiOkResponse({ type: [PublicUserDto], description: 'Every account.' })
  list() {
    return this.users.list();
  }

  @Post()
  @AdminOnly()
  @ApiConflictResponse({ description: 'The e-mail is already in use.' })
  @ApiCreatedResponse({ type: PublicUserDto, description: 'The new account.' })
  create(@Body() body: CreateUserDto) {
    return this.users.create(body);
  }

  @Post(':userId/deactivate')
  @AdminOnly()
  @HttpCode(200)
  @ApiOkResponse({ type: PublicUserDto, description: 'The account, now inactive: its sessions end at once.' })
  deactivate(@Param('userId', ParseIntPipe) userId: number, @CurrentUser() actor: AuthUser) {
    return this.users.setActive(userId, false, actor.id);
  }

  @Post(':userId/reactivate')
  @AdminOnly()
  @HttpCode(200)
  @ApiOkResponse({ type: PublicUserDto, description: 'The account, active again.' })
  reactivate(@Param('userId', ParseIntPipe) userId: number, @CurrentUser() actor: AuthUser) {
    return this.users.setActive(userId, true, actor.id);
  }
}
