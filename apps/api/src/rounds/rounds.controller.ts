import { Body, Controller, Delete, Get, HttpCode, Param, ParseIntPipe, Patch, Post } from '@nestjs/common';
import { ApiConflictResponse, ApiCreatedResponse, ApiNoContentResponse, ApiOkResponse, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import type { AuthUser, TrialAccessContext } from '../common/auth-user';
import { AnyTrialMember, TrialAccess } from '../common/decorators/access.decorator';
import { StaleEditAnswers } from '../protocol-gate/edit-version';
import { CurrentTrialAccess, CurrentUser } from '../common/decorators/current-user.decorator';
import { CreateRoundDto } from './dto/create-round.dto';
import { UpdateRoundDto } from './dto/update-round.dto';
import { RoundsService } from './rounds.service';
import { AssessmentRoundDto } from './dto/assessment-round.dto';

@ApiTags('protocol')
@Controller('trials/:trialId/rounds')
export class RoundsController {
  constructor(private readonly rounds: RoundsService) {}

  @Get()
  @AnyTrialMember()
  @ApiOkResponse({ type: [AssessmentRoundDto], description: 'The assessment rounds in day order.' })
  list(@CurrentTrialAccess() access: TrialAccessContext) {
    return this.rounds.list(access.trialId);
  }

  @Post()
  @TrialAccess('investigator')
  @ApiUnprocessableEntityResponse({ description: 'A field is wrong (e.g. the label is already used, or no measures); nothing written.' })
  @ApiConflictResponse({ description: 'The trial is locked.' })
  @ApiCreatedResponse({ type: AssessmentRoundDto, description: 'The round as saved.' })
  create(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Body() body: CreateRoundDto) {
    return this.rounds.create(access.trialId, user, body);
  }

  @Patch(':id')
  @TrialAccess('investigator')
  @ApiUnprocessableEntityResponse({ description: 'A field is wrong; nothing written.' })
  @StaleEditAnswers(AssessmentRoundDto, 'the trial is locked (problem body).')
  @ApiOkResponse({ type: AssessmentRoundDto, description: 'The round after the change.' })
  update(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @Body() body: UpdateRoundDto) {
    return this.rounds.update(access.trialId, id, user, body);
  }

  @Delete(':id')
  @HttpCode(204)
  @TrialAccess('investigator')
  @ApiConflictResponse({ description: 'The trial is locked, or a site has observations.' })
  @ApiNoContentResponse({ description: 'The round was deleted.' })
  remove(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number) {
    return this.rounds.remove(access.trialId, id, user);
  }
}
