import { Body, Controller, Delete, Get, HttpCode, Param, ParseIntPipe, Patch } from '@nestjs/common';
import { ApiConflictResponse, ApiNoContentResponse, ApiNotFoundResponse, ApiOkResponse, ApiOperation, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import type { AuthUser, TrialAccessContext } from '../common/auth-user';
import { AnyTrialMember, TrialAccess } from '../common/decorators/access.decorator';
import { CurrentTrialAccess, CurrentUser } from '../common/decorators/current-user.decorator';
import { MembersService } from './members.service';
import { MemberDto } from './dto/member.dto';
import { UpdateMemberDto } from './dto/update-member.dto';

const LAST_INVESTIGATOR = 'The change would leave the trial without an investigator.';

@ApiTags('team')
@Controller('trials/:trialId/members')
export class MembersController {
  constructor(private readonly members: MembersService) {}

  @Get()
  @AnyTrialMember()
  @ApiOkResponse({ type: [MemberDto], description: 'Member[]: everyone on the trial with their role and, for collaborators, their site.' })
  list(@CurrentTrialAccess() access: TrialAccessContext) {
    return this.members.list(access.trialId);
  }

  @Patch(':userId')
  @TrialAccess('investigator')
  @ApiOperation({ summary: "Change a member's role and (for a collaborator) sites; takes effect on their next request; e-mailed to them" })
  @ApiOkResponse({ type: [MemberDto], description: 'Member[]: the whole team after the change.' })
  @ApiNotFoundResponse({ description: 'The person is not on this trial.' })
  @ApiConflictResponse({ description: LAST_INVESTIGATOR })
  @ApiUnprocessableEntityResponse({ description: 'role or siteIds wrong (named).' })
  update(
    @CurrentTrialAccess() access: TrialAccessContext,
    @CurrentUser() user: AuthUser,
    @Param('userId', ParseIntPipe) userId: number,
    @Body() body: UpdateMemberDto,
  ) {
    return this.members.update(access.trialId, userId, body, user);
  }

  @Delete(':userId')
  @TrialAccess('investigator')
  @HttpCode(204)
  @ApiOperation({ summary: 'Remove a member: their old session gets 403 at once; what they recorded stays under their name; e-mailed to them' })
  @ApiNoContentResponse({ description: 'Removed.' })
  @ApiNotFoundResponse({ description: 'The person is not on this trial.' })
  @ApiConflictResponse({ description: LAST_INVESTIGATOR })
  async remove(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Param('userId', ParseIntPipe) userId: number): Promise<void> {
    await this.members.remove(access.trialId, userId, user);
  }
}
