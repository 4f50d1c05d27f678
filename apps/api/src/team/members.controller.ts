import { Controller, Get } from '@nestjs/common';
import { ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { TrialAccessContext } from '../auth/auth-user';
import { AnyTrialMember } from '../common/decorators/access.decorator';
import { CurrentTrialAccess } from '../common/decorators/current-user.decorator';
import { MembersService } from './members.service';
import { MemberDto } from './dto/member.dto';

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
}
