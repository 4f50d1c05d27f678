import { Controller, Get, Query, Res, StreamableFile } from '@nestjs/common';
import { ApiExtraModels, ApiOkResponse, ApiOperation, ApiTags, ApiUnprocessableEntityResponse, getSchemaPath } from '@nestjs/swagger';
import type { Response } from 'express';
import type { TrialAccessContext } from '../common/auth-user';
import { AnyTrialMember } from '../common/decorators/access.decorator';
import { CurrentTrialAccess } from '../common/decorators/current-user.decorator';
import { ApiFileResponse } from '../common/openapi/file-response.decorator';
import { findingsBundle } from './bundle/findings-bundle';
import { FindingsQueryDto } from './dto/findings-query.dto';
import { FindingsSummaryDto, FindingsSummaryQueryDto } from './dto/findings-summary.dto';
import { FindingsCache } from './findings-cache';
import { FindingsSummaryService } from './findings-summary.service';
import { FindingsService } from './findings.service';
import { FindingsDto } from './dto/findings.dto';
import { AncovaFindingsDto, CensoredFindingsDto, CountsFindingsDto, OrdinalFindingsDto, RepeatedFindingsDto } from './dto/model-findings.dto';

const ANSWERS = [FindingsDto, CensoredFindingsDto, RepeatedFindingsDto, AncovaFindingsDto, OrdinalFindingsDto, CountsFindingsDto];

@ApiTags('findings')
@ApiExtraModels(...ANSWERS)
@Controller('trials/:trialId/findings')
export class FindingsController {
  constructor(
    private readonly findings: FindingsService,
    private readonly cache: FindingsCache,
    private readonly summaries: FindingsSummaryService,
  ) {}

  @Get()
  @AnyTrialMember()
  @ApiOperation({
    summary: 'The analysis of one measure and round, at one site or all sites combined: the model made for the measure, or the one asked for',
    description:
      '`analysis` left out: the model made for the measure — censored (a time with a cut-off: POST /api/stats/censored), ordinal (a score: ' +
      '/api/stats/ordinal), counts (a count: /api/stats/counts), and for a measured number ancova (a day-0 baseline and one later round: ' +
      '/api/stats/anova with the baseline as covariate), repeated (two or more rounds: /api/stats/repeated) or else anova. A model answers with ' +
      'the stateless endpoint’s body, `analysis`, and `context` (the request and observations sent, which model and why, the options on offer). ' +
      '`analysis=anova`: the same body as POST /api/stats/anova on the stored decimal text (design from the trial; several sites combined: multisite-rcbd), ' +
      'plus `context`: the observations in the order given to the engine (residual index), censoring, missing values, % of control, ' +
      'the rank test (Friedman for blocked designs, blocks = site × block when sites are combined; Kruskal–Wallis otherwise), ' +
      'the not-drained curve for a time with a cut-off, the means over time and the data hash. ' +
      'Answers are kept until the next write to the trial (through any API instance).',
  })
  @ApiOkResponse({ schema: { anyOf: ANSWERS.map((answer) => ({ $ref: getSchemaPath(answer) })) }, description: 'Findings (the ANOVA: AnovaAnswer & {context}) or a model’s answer & {analysis, context}.' })
  @ApiUnprocessableEntityResponse({ description: 'An unknown measure, round or site, no data yet, or the engine’s sentence.' })
  async get(@CurrentTrialAccess() access: TrialAccessContext, @Query() query: FindingsQueryDto, @Res() response: Response): Promise<void> {
    const { body, etag } = await this.cache.served(access.trialId, query, () => this.findings.findings(access.trialId, query));
    // The kept JSON text as it is, with its entity tag: a page asking again with If-None-Match gets 304.
    response.type('application/json').setHeader('ETag', etag);
    response.send(body);
  }

  @Get('summary')
  @AnyTrialMember()
  @ApiOperation({
    summary: 'The recorded values of one measure and round per treatment, before any model: plots, values, not reached by the cut-off, missing, mean, SD, median, range',
    description:
      'Read without the engine, so it answers at once: Findings shows it while the analysis is computed. Takes measureId, roundId and siteId as GET /findings; ' +
      'the round left out is the one GET /findings would analyse (the latest holding values of the measure in the scope). A censored value counts at its cut-off.',
  })
  @ApiOkResponse({ type: FindingsSummaryDto })
  @ApiUnprocessableEntityResponse({ description: 'An unknown measure, round or site, or no values yet.' })
  summary(@CurrentTrialAccess() access: TrialAccessContext, @Query() query: FindingsSummaryQueryDto) {
    return this.summaries.summary(access.trialId, query);
  }

  @Get('bundle')
  @AnyTrialMember()
  @ApiOperation({
    summary: 'The same analysis as a small bundle anyone can check: data.csv, analysis.R, friable.json, README.txt',
    description:
      'Takes the query of GET /findings and bundles the very answer GET /findings gives (from the same cache). analysis.R reproduces the tables from data.csv with R’s standard packages (emmeans, survival, multcomp, nlme, MASS) and writes r-results.json beside friable.json, Friable’s own answer. ' +
      'Covered: every analysis of one-factor designs; the classical ANOVA of factorials (2–4 factors, in blocks or not) and of split and split-split plots at one site, with R’s aov error strata.',
  })
  @ApiFileResponse(['application/zip'], 'A zip named after the trial, measure, round and analysis.')
  @ApiUnprocessableEntityResponse({ description: 'As GET /findings.' })
  async bundle(@CurrentTrialAccess() access: TrialAccessContext, @Query() query: FindingsQueryDto) {
    const answer = await this.cache.answer(access.trialId, query, () => this.findings.findings(access.trialId, query));
    const { filename, bytes } = await findingsBundle(answer);
    return new StreamableFile(bytes, { type: 'application/zip', length: bytes.length, disposition: `attachment; filename="${filename}"` });
  }
}
