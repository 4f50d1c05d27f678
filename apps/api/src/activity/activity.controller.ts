import { Controller, Get, Query } from '@nestjs/common';
import { ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { TrialAccessContext } from '../common/auth-user';
import { AnyTrialMember } from '../common/decorators/access.decorator';
import { CurrentTrialAccess } from '../common/decorators/current-user.decorator';
import { ActivityService } from './activity.service';
import { ActivityQueryDto } from './dto/activity-query.dto';
import { ActivityEntryDto } from './dto/activity-entry.dto';

@ApiTags('activity')
@Controller('trials/:trialId/activity')
export class ActivityController {
  constructor(private readonly activity: ActivityService) {}

  @Get()
  @AnyTrialMember()
  @ApiOkResponse({ type: [ActivityEntryDto], description: 'ActivityEntry[], newest first.' })
  list(@CurrentTrialAccess() access: TrialAccessContext, @Query() query: ActivityQueryDto) {
    return this.activity.list(access.trialId, query);
  }
}
