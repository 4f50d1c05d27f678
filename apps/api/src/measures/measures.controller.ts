import { Body, Controller, Delete, Get, HttpCode, Param, ParseIntPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiConflictResponse, ApiCreatedResponse, ApiNoContentResponse, ApiOkResponse, ApiOperation, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import type { AuthUser, TrialAccessContext } from '../common/auth-user';
import { AnyTrialMember, TrialAccess } from '../common/decorators/access.decorator';
import { StaleEditAnswers } from '../protocol-gate/edit-version';
import { RemovalConfirmQueryDto } from '../protocol-gate/dto/removal-confirm-query.dto';
import { RemovalImpactDto } from '../protocol-gate/dto/removal-impact.dto';
import { CurrentTrialAccess, CurrentUser } from '../common/decorators/current-user.decorator';
import { CreateMeasureDto } from './dto/create-measure.dto';
import { UpdateMeasureDto } from './dto/update-measure.dto';
import { MeasuresService } from './measures.service';
import { MeasureDto } from './dto/measure.dto';

@ApiTags('protocol')
@Controller('trials/:trialId/measures')
export class MeasuresController {
  constructor(private readonly measures: MeasuresService) {}

  @Get()
  @AnyTrialMember()
  @ApiOkResponse({ type: [MeasureDto], description: 'The measures in their order.' })
  list(@CurrentTrialAccess() access: TrialAccessContext) {
    return this.measures.list(access.trialId);
  }

  @Post()
  @TrialAccess('investigator')
  @ApiUnprocessableEntityResponse({ description: 'A field is wrong (e.g. the code is already used); nothing written.' })
  @ApiConflictResponse({ description: 'The trial is locked.' })
  @ApiCreatedResponse({ type: MeasureDto, description: 'The measure as saved.' })
  create(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Body() body: CreateMeasureDto) {
    return this.measures.create(access.trialId, user, body);
  }

  @Patch(':id')
  @TrialAccess('investigator')
  @ApiUnprocessableEntityResponse({ description: 'A field is wrong; nothing written.' })
  @StaleEditAnswers(MeasureDto, 'the trial is locked, or a change of meaning of a measure with observations (problem body).')
  @ApiOkResponse({ type: MeasureDto, description: 'The measure after the change.' })
  update(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @Body() body: UpdateMeasureDto) {
    return this.measures.update(access.trialId, id, user, body);
  }

  @Get(':id/removal-impact')
  @TrialAccess('investigator')
  @ApiOperation({ summary: 'What removing the measure would archive (its values in every round), per site and in words, asked before removing it' })
  @ApiOkResponse({ type: RemovalImpactDto, description: 'RemovalImpact: values, notes and photos per site, a sentence, whether the trial code must be typed, and a refusal if any.' })
  removalImpact(@CurrentTrialAccess() access: TrialAccessContext, @Param('id', ParseIntPipe) id: number) {
    return this.measures.removalImpact(access.trialId, id);
  }

  @Delete(':id')
  @HttpCode(204)
  @TrialAccess('investigator')
  @ApiUnprocessableEntityResponse({ description: 'Values are recorded for it and the trial code was not typed as confirm (or was mistyped); nothing written.' })
  @ApiConflictResponse({ description: 'The trial is locked, or it is the only measure of a round.' })
  @ApiNoContentResponse({ description: 'The measure was archived, with its recorded values.' })
  remove(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @Query() query: RemovalConfirmQueryDto) {
    return this.measures.remove(access.trialId, id, user, query.confirm);
  }
}
