import type { IntakeColumnChoice, IntakeImport } from '@friable/contracts';
import { Controller, Delete, Get, HttpCode, Param, Query } from '@nestjs/common';
import { ApiNoContentResponse, ApiNotFoundResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { InjectConnection } from '@nestjs/sequelize';
import type { Sequelize } from 'sequelize-typescript';
import type { AuthUser, TrialAccessContext } from '../common/auth-user';
import { AnyTrialMember, TrialAccess } from '../common/decorators/access.decorator';
import { CurrentTrialAccess, CurrentUser } from '../common/decorators/current-user.decorator';
import { ActivityService } from '../activity/activity.service';
import { IntakeImportsQueryDto } from './dto/intake-imports-query.dto';
import { IntakeColumnChoiceDto, IntakeImportDto } from './dto/intake-responses.dto';
import { IntakeColumnsService } from './intake-columns.service';
import { IntakeImportsService } from './intake-imports.service';

@ApiTags('intake')
@Controller('trials/:trialId')
export class IntakeImportsController {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly imports: IntakeImportsService,
    private readonly columns: IntakeColumnsService,
    private readonly activity: ActivityService,
  ) {}

  @Get('intake-imports')
  @AnyTrialMember()
  @ApiOkResponse({ type: [IntakeImportDto], description: 'The latest ten uploads sent for a site and round, newest first, running ones with their stage and counts.' })
  recent(@CurrentTrialAccess() access: TrialAccessContext, @Query() query: IntakeImportsQueryDto): Promise<IntakeImport[]> {
    return this.imports.recent(access.trialId, query.siteId, query.roundId);
  }

  @Get('intake-imports/:ticket')
  @AnyTrialMember()
  @ApiOkResponse({ type: IntakeImportDto, description: 'One upload: its stage (checking, comparing, writing, then done, refused, failed or interrupted) and counts, then its answer.' })
  @ApiNotFoundResponse({ description: 'No upload with this ticket in the trial.' })
  one(@CurrentTrialAccess() access: TrialAccessContext, @Param('ticket') ticket: string): Promise<IntakeImport> {
    return this.imports.one(access.trialId, ticket.slice(0, 64));
  }

  @Get('intake-columns')
  @AnyTrialMember()
  @ApiOkResponse({ type: [IntakeColumnChoiceDto], description: 'What the trial’s uploads read their own column headers as, where someone chose it: the next upload starts from these.' })
  remembered(@CurrentTrialAccess() access: TrialAccessContext): Promise<IntakeColumnChoice[]> {
    return this.columns.list(access.trialId);
  }

  @Delete('intake-columns')
  @HttpCode(204)
  @TrialAccess('investigator')
  @ApiNoContentResponse({ description: 'The remembered column choices are forgotten; headers are matched by their names again.' })
  async forget(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser): Promise<void> {
    await this.sequelize.transaction(async (transaction) => {
      const forgotten = await this.columns.forget(transaction, access.trialId);
      if (forgotten === 0) return;
      await this.activity.record(transaction, {
        trialId: access.trialId,
        userId: user.id,
        kind: 'intake.columns-forgotten',
        summary: `Forgot the column choices of ${forgotten === 1 ? 'one header' : `${forgotten} headers`}; uploads match headers by their names again.`,
        details: { forgotten },
      });
    });
  }
}
