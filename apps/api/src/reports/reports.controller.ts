import { Controller, Get } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import type { TrialAccessContext } from '../common/auth-user';
import { AnyTrialMember } from '../common/decorators/access.decorator';
import { CurrentTrialAccess } from '../common/decorators/current-user.decorator';
import { ReportsService } from './reports.service';
import { TrialReportDto } from './dto/trial-report.dto';

@ApiTags('reports')
@Controller('trials/:trialId/report')
export class ReportsController {
  constructor(private readonly reports: ReportsService) {}

  @Get()
  @AnyTrialMember()
  @ApiOperation({ summary: 'Everything the printable report needs: protocol, sites, per measure (latest round with data, all sites combined) the model made for it with its choices and tables, the classical ANOVA and means with letters, cautions and a plain paragraph' })
  @ApiOkResponse({ type: TrialReportDto, description: 'TrialReport.' })
  get(@CurrentTrialAccess() access: TrialAccessContext) {
    return this.reports.report(access.trialId);
  }
}
