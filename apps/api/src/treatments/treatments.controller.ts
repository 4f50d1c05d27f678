import { Body, Controller, Delete, Get, HttpCode, Param, ParseIntPipe, Patch, Post } from '@nestjs/common';
import { ApiConflictResponse, ApiCreatedResponse, ApiNoContentResponse, ApiOkResponse, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import type { AuthUser, TrialAccessContext } from '../common/auth-user';
import { AnyTrialMember, TrialAccess } from '../common/decorators/access.decorator';
import { StaleEditAnswers } from '../protocol-gate/edit-version';
import { CurrentTrialAccess, CurrentUser } from '../common/decorators/current-user.decorator';
import { CreateTreatmentDto } from './dto/create-treatment.dto';
import { UpdateTreatmentDto } from './dto/update-treatment.dto';
import { TreatmentsService } from './treatments.service';
import { TreatmentDto } from './dto/treatment.dto';

@ApiTags('protocol')
@Controller('trials/:trialId/treatments')
export class TreatmentsController {
  constructor(private readonly treatments: TreatmentsService) {}

  @Get()
  @AnyTrialMember()
  @ApiOkResponse({ type: [TreatmentDto], description: 'The treatments in their order.' })
  list(@CurrentTrialAccess() access: TrialAccessContext) {
    return this.treatments.list(access.trialId);
  }

  @Post()
  @TrialAccess('investigator')
  @ApiUnprocessableEntityResponse({ description: 'A field is wrong (e.g. the code is already used); nothing written.' })
  @ApiConflictResponse({ description: 'The trial is locked, is factorial, or a site has observations.' })
  @ApiCreatedResponse({ type: TreatmentDto, description: 'The treatment as saved.' })
  create(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Body() body: CreateTreatmentDto) {
    return this.treatments.create(access.trialId, user, body);
  }

  @Patch(':id')
  @TrialAccess('investigator')
  @ApiUnprocessableEntityResponse({ description: 'A field is wrong; nothing written.' })
  @StaleEditAnswers(TreatmentDto, 'the trial is locked (problem body).')
  @ApiOkResponse({ type: TreatmentDto, description: 'The treatment after the change.' })
  update(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @Body() body: UpdateTreatmentDto) {
    return this.treatments.update(access.trialId, id, user, body);
  }

  @Delete(':id')
  @HttpCode(204)
  @TrialAccess('investigator')
  @ApiConflictResponse({ description: 'The trial is locked, is factorial, or a site has observations of it.' })
  @ApiNoContentResponse({ description: 'The treatment was deleted.' })
  remove(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number) {
    return this.treatments.remove(access.trialId, id, user);
  }
}
