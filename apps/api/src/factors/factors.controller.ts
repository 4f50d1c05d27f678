import { Body, Controller, Get, Put } from '@nestjs/common';
import { ApiConflictResponse, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import type { AuthUser, TrialAccessContext } from '../auth/auth-user';
import { AnyTrialMember, TrialAccess } from '../common/decorators/access.decorator';
import { CurrentTrialAccess, CurrentUser } from '../common/decorators/current-user.decorator';
import { FactorsDto } from './dto/factors.dto';
import { FactorsService } from './factors.service';

@ApiTags('protocol')
@Controller('trials/:trialId/factors')
export class FactorsController {
  constructor(private readonly factors: FactorsService) {}

  @Get()
  @AnyTrialMember()
  list(@CurrentTrialAccess() access: TrialAccessContext) {
    return this.factors.listForTrial(access.trialId);
  }

  @Put()
  @TrialAccess('investigator')
  @ApiUnprocessableEntityResponse({ description: 'A number of factors the design does not take, a factor with fewer than two levels, repeated level codes, or a level rate without its unit.' })
  @ApiConflictResponse({ description: 'The trial is locked, is neither factorial nor split plot, or changing the level codes would clear the layout of a site with observations.' })
  replace(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Body() body: FactorsDto) {
    return this.factors.replace(access.trialId, user, body);
  }
}
