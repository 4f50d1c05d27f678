import { Controller, Get, Query } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import type { TrialAccessContext } from '../auth/auth-user';
import { AnyTrialMember } from '../common/decorators/access.decorator';
import { CurrentTrialAccess } from '../common/decorators/current-user.decorator';
import { FindingsQueryDto } from './dto/findings-query.dto';
import { FindingsCache } from './findings-cache';
import { FindingsService } from './findings.service';
import { FindingsDto } from './dto/findings.dto';

@ApiTags('findings')
@Controller('trials/:trialId/findings')
export class FindingsController {
  constructor(
    private readonly findings: FindingsService,
    private readonly cache: FindingsCache,
  ) {}

  @Get()
  @AnyTrialMember()
  @ApiOperation({
    summary: 'The analysis of one measure and round, at one site or all sites combined',
    description:
      'The same body as POST /api/stats/anova on the stored decimal text (design from the trial; several sites combined: multisite-rcbd), ' +
      'plus `context`: the observations in the order given to the engine (residual index), censoring, missing values, % of control, ' +
      'the rank test (Friedman for blocked designs, blocks = site × block when sites are combined; Kruskal–Wallis otherwise), ' +
      'the not-drained curve for a time with a cut-off, the means over time and the data hash. ' +
      'Answers are kept until the next write to the trial (through any API instance).',
  })
  @ApiOkResponse({ type: FindingsDto, description: 'Findings: AnovaAnswer & {context}.' })
  @ApiUnprocessableEntityResponse({ description: 'An unknown measure, round or site, no data yet, or the engine’s sentence.' })
  get(@CurrentTrialAccess() access: TrialAccessContext, @Query() query: FindingsQueryDto) {
    return this.cache.answer(access.trialId, query, () => this.findings.findings(access.trialId, query));
  }
}
