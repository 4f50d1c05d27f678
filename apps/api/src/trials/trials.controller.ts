import { Body, Controller, Get, Patch, Post } from '@nestjs/common';
import { ApiConflictResponse, ApiCreatedResponse, ApiOkResponse, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import type { AuthUser, TrialAccessContext } from '../common/auth-user';
import { AnyTrialMember, SignedIn, TrialAccess } from '../common/decorators/access.decorator';
import { StaleEditAnswers } from '../protocol-gate/edit-version';
import { CurrentTrialAccess, CurrentUser } from '../common/decorators/current-user.decorator';
import { CreateTrialDto } from './dto/create-trial.dto';
import { UpdateTrialDto } from './dto/update-trial.dto';
import { TrialsService } from './trials.service';
import { TrialSummaryDto } from './dto/trial-summary.dto';
import { TrialDetailDto } from './dto/trial-detail.dto';

@ApiTags('trials')
@Controller('trials')
export class TrialsController {
  constructor(private readonly trials: TrialsService) {}

  @Get()
  @SignedIn()
  @ApiOkResponse({ type: [TrialSummaryDto], description: 'The trials the caller belongs to (every trial for an administrator).' })
  list(@CurrentUser() user: AuthUser) {
    return this.trials.listFor(user);
  }

  @Post()
  @SignedIn()
  @ApiConflictResponse({ description: 'The code is already used by another trial.' })
  @ApiCreatedResponse({ type: TrialSummaryDto, description: 'The new draft trial; the caller is its investigator.' })
  create(@Body() body: CreateTrialDto, @CurrentUser() user: AuthUser) {
    return this.trials.create(body, user);
  }

  @Get(':trialId')
  @AnyTrialMember()
  @ApiOkResponse({ type: TrialDetailDto, description: 'TrialDetail: the whole protocol with its activation checks.' })
  get(@CurrentTrialAccess() access: TrialAccessContext) {
    return this.trials.get(access);
  }

  @Patch(':trialId')
  @TrialAccess('investigator')
  @ApiOkResponse({ type: TrialDetailDto, description: 'TrialDetail after the change.' })
  @ApiUnprocessableEntityResponse({ description: 'A field is wrong, or (status active) the activation checks fail: errors lists each problem.' })
  @StaleEditAnswers(TrialDetailDto, 'the trial is locked, or the status change is not allowed (problem body).')
  update(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Body() body: UpdateTrialDto) {
    return this.trials.update(access, body, user);
  }
}
