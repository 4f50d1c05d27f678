import { Body, Controller, HttpCode, Post } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import { SignedIn } from '../common/decorators/access.decorator';
import { AnovaRequestDto } from './dto/anova-request.dto';
import { CensoredAnswerDto } from './dto/censored-answer.dto';
import { CensoredRequestDto } from './dto/censored-request.dto';
import { CountsAnswerDto } from './dto/counts-answer.dto';
import { CountsRequestDto, OrdinalRequestDto } from './dto/labelled-value-request.dto';
import { OrdinalAnswerDto } from './dto/ordinal-answer.dto';
import { RepeatedAnswerDto } from './dto/repeated-answer.dto';
import { RepeatedRequestDto } from './dto/repeated-request.dto';
import { PowerRequestDto } from './dto/power-request.dto';
import { RankTestRequestDto } from './dto/rank-test-request.dto';
import { StatsService } from './stats.service';
import { PowerAnswerDto } from './dto/power-answer.dto';
import { AnovaAnswerDto, RankTestAnswerDto } from './dto/anova-answer.dto';

/** The stateless analysis API: the same engine the Findings pages use, for any signed-in person. */
@ApiTags('stats')
@Controller('stats')
export class StatsController {
  constructor(private readonly stats: StatsService) {}

  @Post('anova')
  @SignedIn()
  @HttpCode(200)
  @ApiOperation({
    summary: 'ANOVA, least-squares means, mean separation, letters and diagnostics',
    description:
      'Designs: crd (treatment), rcbd (block, treatment), multisite-rcbd (site, block:site, treatment, site:treatment): sums of squares sequential in that order; ' +
      'with sites random (the default) treatment is tested against site:treatment and site against block:site. ' +
      'factorial-crd, factorial-rcbd, multisite-factorial-rcbd (2–4 factors), split-plot, multisite-split-plot (2 factors, whole-plot first) and split-split-plot (3): ' +
      'factorNames and observations with factors {name: level}; every main effect and interaction (terms are factor names joined by ":" in the order of factorNames). ' +
      'model: anova (classical; each term tested against its stratum error — block:A for the whole-plot factor — or, with random sites, its site interaction; an unbalanced ' +
      'factorial gets the type III least-squares ANOVA) or reml (blocks, whole plots, sites and site interactions random; Kenward–Roger F tests, rows with numDf and denDf, ss and ms null). ' +
      'Default: anova when every plot is present, else reml; the answer says which (model) and why. Each anova row names its errorTerm. The answer adds strata, ' +
      'least-squares means of every term (marginalMeans), each factor compared in its own stratum (factorComparisons), standard errors of a difference by kind ' +
      '(differences: a split plot’s four, with the weighted t where strata mix) and, for significant two-factor interactions, slices with letters inside each.',
  })
  @ApiOkResponse({ type: AnovaAnswerDto, description: '{anova, summary, means, comparisons, letters, diagnostics, warnings}' })
  @ApiUnprocessableEntityResponse({ description: 'A malformed body (naming the field) or a statistically impossible request (the engine’s sentence).' })
  anova(@Body() body: AnovaRequestDto) {
    return this.stats.anova(body);
  }

  @Post('censored')
  @SignedIn()
  @HttpCode(200)
  @ApiOperation({
    summary: 'Drain times with a cut-off: not-drained curves, stratified log-rank test and time ratios to the control',
    description:
      'Product-limit curves per treatment with 95 % log-scale bands and medians (null: not reached), per site too; the log-rank test stratified by block ' +
      '(site × block with several sites); an accelerated-failure-time model (weibull, lognormal or loglogistic) with blocks and sites as terms, a ' +
      'likelihood-ratio test of each term by dropping it (a site with its blocks), and time ratios to the control with simultaneous 95 % limits and ' +
      'single-step (Dunnett-type) adjusted p-values. A block where nothing drained is left out of the model; a treatment that never drained leaves ' +
      'the model out (warnings say so).',
  })
  @ApiOkResponse({ type: CensoredAnswerDto })
  @ApiUnprocessableEntityResponse({ description: 'A malformed body (naming the field) or data the analysis cannot take (the engine’s sentence).' })
  censored(@Body() body: CensoredRequestDto) {
    return this.stats.censored(body);
  }

  @Post('repeated')
  @SignedIn()
  @HttpCode(200)
  @ApiOperation({
    summary: 'One measure over several rounds on the same plots: REML with a within-plot covariance, Kenward–Roger tests, means per round, split plot in time',
    description:
      'Blocks (and sites), treatment, round and treatment × round fitted by REML with compound symmetry, continuous-time AR(1) on the day offsets ' +
      '(unequal spacing honoured) or unstructured covariance — auto: every one that applies, the lowest AIC chosen and shown beside the others; ' +
      'Kenward–Roger F tests of treatment, round and their interaction and of treatment within each round; least-squares means per treatment and ' +
      'round with Kenward–Roger SEs. Beside it the classical split plot in time on the plots seen at every round, with Mauchly’s test and the ' +
      'Greenhouse–Geisser and Huynh–Feldt corrections.',
  })
  @ApiOkResponse({ type: RepeatedAnswerDto })
  @ApiUnprocessableEntityResponse({ description: 'A malformed body (naming the field) or data the analysis cannot take (the engine’s sentence).' })
  repeated(@Body() body: RepeatedRequestDto) {
    return this.stats.repeated(body);
  }

  @Post('ordinal')
  @SignedIn()
  @HttpCode(200)
  @ApiOperation({
    summary: 'Scores on an ordered scale: proportional-odds model with blocks, odds ratios to the control, predicted shares, rank test',
    description:
      'A cumulative-logit (proportional-odds) model with the design’s blocks and sites; a likelihood-ratio test of each term by dropping it; each ' +
      'treatment’s odds of a higher score against the control with simultaneous 95 % limits and single-step adjusted p-values; the predicted share of ' +
      'each score per treatment averaged over blocks; and the rank test beside it (Friedman with blocks, else Kruskal–Wallis).',
  })
  @ApiOkResponse({ type: OrdinalAnswerDto })
  @ApiUnprocessableEntityResponse({ description: 'A malformed body (naming the field) or data the analysis cannot take (the engine’s sentence).' })
  ordinal(@Body() body: OrdinalRequestDto) {
    return this.stats.ordinal(body);
  }

  @Post('counts')
  @SignedIn()
  @HttpCode(200)
  @ApiOperation({
    summary: 'Counts per plot: Poisson log-linear model with blocks, overdispersion check, quasi-Poisson when needed, rate ratios to the control',
    description:
      'A Poisson log-linear model with the design’s blocks and sites; overdispersion judged by Pearson’s χ² on the residual df, and when present ' +
      '(family auto) a quasi-Poisson fit: standard errors × √dispersion, F tests of each term, t-based limits. Rate ratios to the control with ' +
      'simultaneous 95 % limits and single-step adjusted p-values, and the model’s count per plot for each treatment.',
  })
  @ApiOkResponse({ type: CountsAnswerDto })
  @ApiUnprocessableEntityResponse({ description: 'A malformed body (naming the field) or data the analysis cannot take (the engine’s sentence).' })
  counts(@Body() body: CountsRequestDto) {
    return this.stats.counts(body);
  }

  @Post('friedman')
  @SignedIn()
  @HttpCode(200)
  @ApiOperation({ summary: 'Friedman rank test for blocked data (tie-corrected); incomplete blocks are dropped and listed' })
  @ApiOkResponse({ type: RankTestAnswerDto, description: 'Statistic, df and p; the blocks used and those dropped.' })
  friedman(@Body() body: RankTestRequestDto) {
    return this.stats.friedman(body);
  }

  @Post('kruskal')
  @SignedIn()
  @HttpCode(200)
  @ApiOperation({ summary: 'Kruskal–Wallis rank test (tie-corrected)' })
  @ApiOkResponse({ type: RankTestAnswerDto, description: 'Statistic, df and p.' })
  kruskal(@Body() body: RankTestRequestDto) {
    return this.stats.kruskal(body);
  }

  @Post('power')
  @SignedIn()
  @HttpCode(200)
  @ApiOperation({
    summary: 'Power of an RCBD by the noncentral F distribution, or the blocks needed for a target power',
    description: 'Noncentrality = sites × blocks × (difference / cv)² / 2: two treatments differ by the difference, the others sit at the grand mean.',
  })
  @ApiOkResponse({ type: PowerAnswerDto, description: 'With blocks: the power and its F distribution. With targetPower: the blocks needed and their power.' })
  power(@Body() body: PowerRequestDto) {
    return this.stats.power(body);
  }
}
