import { Body, Controller, Delete, Get, HttpCode, Param, ParseIntPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiConflictResponse, ApiCreatedResponse, ApiNoContentResponse, ApiOkResponse, ApiOperation, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import type { AuthUser, TrialAccessContext } from '../common/auth-user';
import { AnyTrialMember, TrialAccess } from '../common/decorators/access.decorator';
import { StaleEditAnswers } from '../protocol-gate/edit-version';
import { RemovalConfirmQueryDto } from '../protocol-gate/dto/removal-confirm-query.dto';
import { RemovalImpactDto } from '../protocol-gate/dto/removal-impact.dto';
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

  @Get(':id/removal-impact')
  @TrialAccess('investigator')
  @ApiOperation({ summary: 'What removing the round would archive (its values of every measure and its photos), per site and in words, asked before removing it' })
  @ApiOkResponse({ type: RemovalImpactDto, description: 'RemovalImpact: values, notes and photos per site, a sentence, whether the trial code must be typed, and a refusal if any.' })
  removalImpact(@CurrentTrialAccess() access: TrialAccessContext, @Param('id', ParseIntPipe) id: number) {
    return this.rounds.removalImpact(access.trialId, id);
  }

  @Delete(':id')
  @HttpCode(204)
  @TrialAccess('investigator')
  @ApiUnprocessableEntityResponse({ description: 'Values or photos are recorded for it and the trial code was not typed as confirm (or was mistyped); nothing written.' })
  @ApiConflictResponse({ description: 'The trial is locked.' })
  @ApiNoContentResponse({ description: 'The round was archived, with its recorded values and photos.' })
  remove(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @Query() query: RemovalConfirmQueryDto) {
    return this.rounds.remove(access.trialId, id, user, query.confirm);
  }
}
