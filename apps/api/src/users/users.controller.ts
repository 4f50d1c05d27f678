import { Body, Controller, Get, HttpCode, Param, ParseIntPipe, Post } from '@nestjs/common';
import { ApiConflictResponse, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user';
import { AdminOnly } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { CreateUserDto } from './dto/create-user.dto';
import { UsersService } from './users.service';

@ApiTags('users')
@Controller('users')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  @AdminOnly()
  list() {
    return this.users.list();
  }

  @Post()
  @AdminOnly()
  @ApiConflictResponse({ description: 'The e-mail is already in use.' })
  create(@Body() body: CreateUserDto) {
    return this.users.create(body);
  }

  @Post(':userId/deactivate')
  @AdminOnly()
  @HttpCode(200)
  deactivate(@Param('userId', ParseIntPipe) userId: number, @CurrentUser() actor: AuthUser) {
    return this.users.setActive(userId, false, actor.id);
  }

  @Post(':userId/reactivate')
  @AdminOnly()
  @HttpCode(200)
  reactivate(@Param('userId', ParseIntPipe) userId: number, @CurrentUser() actor: AuthUser) {
    return this.users.setActive(userId, true, actor.id);
  }
}
