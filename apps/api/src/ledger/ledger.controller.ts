import { Body, Controller, Get, Param, ParseIntPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiCreatedResponse, ApiOkResponse, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import type { AuthUser, TrialAccessContext } from '../common/auth-user';
import { AnyTrialMember, TrialAccess } from '../common/decorators/access.decorator';
import { CurrentTrialAccess, CurrentUser } from '../common/decorators/current-user.decorator';
import { CreateObservationDto } from './dto/create-observation.dto';
import { EditObservationDto } from './dto/edit-observation.dto';
import { ObservationQueryDto } from './dto/observation-query.dto';
import { LedgerService } from './ledger.service';
import { StaleEditAnswers } from '../protocol-gate/edit-version';
import { ObservationHistoryEntryDto, RecordedObservationDto } from './dto/recorded-observation.dto';

@ApiTags('ledger')
@Controller('trials/:trialId/observations')
export class LedgerController {
  constructor(private readonly ledger: LedgerService) {}

  @Get()
  @AnyTrialMember()
  @ApiOkResponse({ type: [RecordedObservationDto], description: 'Observation[]: each value with its plot, site, block, treatment, round, measure, text and number, censoring, version and who recorded it.' })
  list(@CurrentTrialAccess() access: TrialAccessContext, @Query() query: ObservationQueryDto) {
    return this.ledger.list(access.trialId, query);
  }

  @Post()
  @TrialAccess('investigator', 'collaborator')
  @ApiCreatedResponse({ type: RecordedObservationDto, description: 'Observation: the value recorded (version 1).' })
  @StaleEditAnswers(RecordedObservationDto, 'the cell already has a value (also with the current value), or the trial is locked (problem body).')
  @ApiUnprocessableEntityResponse({ description: 'The value is refused as Intake would refuse it, or it needs acceptWarnings.' })
  create(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Body() body: CreateObservationDto) {
    return this.ledger.create(access, user, body);
  }

  @Patch(':observationId')
  @TrialAccess('investigator', 'collaborator')
  @ApiOkResponse({ type: RecordedObservationDto, description: 'Observation after the save (version + 1; unchanged when nothing differs).' })
  @StaleEditAnswers(RecordedObservationDto, 'the trial is locked (problem body).')
  @ApiUnprocessableEntityResponse({ description: 'The value is refused as Intake would refuse it, or it needs acceptWarnings.' })
  edit(
    @CurrentTrialAccess() access: TrialAccessContext,
    @CurrentUser() user: AuthUser,
    @Param('observationId', ParseIntPipe) observationId: number,
    @Body() body: EditObservationDto,
  ) {
    return this.ledger.edit(access, user, observationId, body);
  }

  @Get(':observationId/history')
  @AnyTrialMember()
  @ApiOkResponse({ type: [ObservationHistoryEntryDto], description: 'ObservationHistoryEntry[], oldest first: who, when, before, after, by upload or by edit.' })
  history(@CurrentTrialAccess() access: TrialAccessContext, @Param('observationId', ParseIntPipe) observationId: number) {
    return this.ledger.history(access.trialId, observationId);
  }
}
