import { Body, Controller, HttpCode, Post } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import { SignedIn } from '../common/decorators/access.decorator';
import { AnovaRequestDto } from './dto/anova-request.dto';
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
      'Designs: crd (treatment), rcbd (block, treatment), factorial-rcbd (block, A, B, A:B), multisite-rcbd (site, block:site, treatment, site:treatment). ' +
      'Sums of squares are sequential in that order. With sites random (the default) treatment is tested against site:treatment and site against block:site.',
  })
  @ApiOkResponse({ type: AnovaAnswerDto, description: '{anova, summary, means, comparisons, letters, diagnostics, warnings}' })
  @ApiUnprocessableEntityResponse({ description: 'A malformed body (naming the field) or a statistically impossible request (the engine’s sentence).' })
  anova(@Body() body: AnovaRequestDto) {
    return this.stats.anova(body);
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
