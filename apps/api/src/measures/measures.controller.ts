import { Body, Controller, Delete, Get, HttpCode, Param, ParseIntPipe, Patch, Post } from '@nestjs/common';
import { ApiConflictResponse, ApiCreatedResponse, ApiNoContentResponse, ApiOkResponse, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import type { AuthUser, TrialAccessContext } from '../common/auth-user';
import { AnyTrialMember, TrialAccess } from '../common/decorators/access.decorator';
import { StaleEditAnswers } from '../protocol-gate/edit-version';
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

  @Delete(':id')
  @HttpCode(204)
  @TrialAccess('investigator')
  @ApiConflictResponse({ description: 'The trial is locked, a site has observations of it, or it is the only measure of a round.' })
  @ApiNoContentResponse({ description: 'The measure was deleted.' })
  remove(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number) {
    return this.measures.remove(access.trialId, id, user);
  }
}
