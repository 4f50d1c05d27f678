import { Body, Controller, Get, Put } from '@nestjs/common';
import { ApiOkResponse, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import type { AuthUser, TrialAccessContext } from '../common/auth-user';
import { AnyTrialMember, TrialAccess } from '../common/decorators/access.decorator';
import { StaleEditAnswers } from '../protocol-gate/edit-version';
import { CurrentTrialAccess, CurrentUser } from '../common/decorators/current-user.decorator';
import { FactorsDto } from './dto/factors.dto';
import { FactorsService } from './factors.service';
import { FactorsReplacedDto, TrialFactorDto } from './dto/trial-factor.dto';

@ApiTags('protocol')
@Controller('trials/:trialId/factors')
export class FactorsController {
  constructor(private readonly factors: FactorsService) {}

  @Get()
  @AnyTrialMember()
  @ApiOkResponse({ type: [TrialFactorDto], description: 'The factors with their levels (factorial trials).' })
  list(@CurrentTrialAccess() access: TrialAccessContext) {
    return this.factors.listForTrial(access.trialId);
  }

  @Put()
  @TrialAccess('investigator')
  @ApiUnprocessableEntityResponse({ description: 'A number of factors the design does not take, a factor with fewer than two levels, repeated level codes, or a level rate without its unit.' })
  @StaleEditAnswers([TrialFactorDto], 'the trial is locked, is neither factorial nor split plot, or changing the level codes would clear the layout of a site with observations (problem body).')
  @ApiOkResponse({ type: FactorsReplacedDto, description: 'The factors and the treatments made from every combination of their levels.' })
  replace(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Body() body: FactorsDto) {
    return this.factors.replace(access.trialId, user, body);
  }
}
