import { Controller, Get, Query } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import type { TrialAccessContext } from '../common/auth-user';
import { AnyTrialMember } from '../common/decorators/access.decorator';
import { CurrentTrialAccess } from '../common/decorators/current-user.decorator';
import { ReportsService } from './reports.service';
import { ReportQueryDto } from './dto/report-query.dto';
import { TrialReportDto } from './dto/trial-report.dto';

@ApiTags('reports')
@Controller('trials/:trialId/report')
export class ReportsController {
  constructor(private readonly reports: ReportsService) {}

  @Get()
  @AnyTrialMember()
  @ApiOperation({ summary: 'Everything the printable report needs: protocol, sites, per measure the model made for it with its choices and tables, the classical ANOVA and means with letters (the round, scope and mean separation chosen on the Findings page; by default each measure’s latest round with data, all sites combined), cautions and a plain paragraph' })
  @ApiOkResponse({ type: TrialReportDto, description: 'TrialReport.' })
  get(@CurrentTrialAccess() access: TrialAccessContext, @Query() query: ReportQueryDto) {
    return this.reports.report(access.trialId, query);
  }
}
