import { Body, Controller, Get, HttpCode, Param, ParseIntPipe, Patch, Post } from '@nestjs/common';
import { ApiBadRequestResponse, ApiConflictResponse, ApiCreatedResponse, ApiOkResponse, ApiOperation, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import type { AuthUser } from '../common/auth-user';
import { PublicUserDto } from '../auth/dto/auth-answers.dto';
import { AdminOnly, SignedIn } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { CreateUserDto } from './dto/create-user.dto';
import { MySettingsDto, UpdateUserDto } from './dto/update-user.dto';
import { UsersService } from './users.service';

@ApiTags('users')
@Controller('users')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  @AdminOnly()
  @ApiOkResponse({ type: PublicUserDto, isArray: true, description: 'Everyone, by name, with their last sign-in.' })
  list() {
    return this.users.list();
  }

  @Post()
  @AdminOnly()
  @ApiCreatedResponse({ type: PublicUserDto })
  @ApiConflictResponse({ description: 'The e-mail is already in use.' })
  @ApiUnprocessableEntityResponse({ description: 'A field is wrong, or the password is too short or too common (a sentence).' })
  create(@Body() body: CreateUserDto) {
    return this.users.create(body);
  }

  // Declared before :userId so "me" is never read as an id.
  @Patch('me')
  @SignedIn()
  @ApiOperation({ summary: 'One’s own display name, locale for numbers and dates, and e-mail preferences' })
  @ApiOkResponse({ type: PublicUserDto })
  @ApiUnprocessableEntityResponse({ description: 'A field is wrong (named), e.g. an unknown locale.' })
  updateMine(@CurrentUser() user: AuthUser, @Body() body: MySettingsDto) {
    return this.users.updateMine(user.id, body);
  }

  @Patch(':userId')
  @AdminOnly()
  @ApiOperation({ summary: 'An administrator changes an account; isActive false ends its sessions at once' })
  @ApiOkResponse({ type: PublicUserDto })
  @ApiBadRequestResponse({ description: 'Administrators cannot deactivate themselves or drop their own rights.' })
  @ApiConflictResponse({ description: 'The e-mail is already in use.' })
  update(@Param('userId', ParseIntPipe) userId: number, @Body() body: UpdateUserDto, @CurrentUser() actor: AuthUser) {
    return this.users.update(userId, body, actor.id);
  }

  @Post(':userId/deactivate')
  @AdminOnly()
  @HttpCode(200)
  @ApiOkResponse({ type: PublicUserDto, description: 'Deactivated: every session ended, sign-in refused.' })
  deactivate(@Param('userId', ParseIntPipe) userId: number, @CurrentUser() actor: AuthUser) {
    return this.users.setActive(userId, false, actor.id);
  }

  @Post(':userId/reactivate')
  @AdminOnly()
  @HttpCode(200)
  @ApiOkResponse({ type: PublicUserDto, description: 'Reactivated with no valid session: old tokens stay dead.' })
  reactivate(@Param('userId', ParseIntPipe) userId: number, @CurrentUser() actor: AuthUser) {
    return this.users.setActive(userId, true, actor.id);
  }
}
