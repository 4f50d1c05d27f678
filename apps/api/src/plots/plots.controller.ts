import { Controller, Get, Header, Param, ParseIntPipe, Query, Res, StreamableFile } from '@nestjs/common';
import { ApiConflictResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import type { TrialAccessContext } from '../common/auth-user';
import { AnyTrialMember } from '../common/decorators/access.decorator';
import { CurrentTrialAccess } from '../common/decorators/current-user.decorator';
import { AmountsQueryDto, PlotsQueryDto } from './dto/plots-query.dto';
import { PlotsService } from './plots.service';
import { PlotDto } from './dto/plot.dto';
import { LevelAmountDto, PlotAmountDto } from './dto/plot-amount.dto';
import { ApiFileResponse, XLSX_MEDIA_TYPE } from '../common/openapi/file-response.decorator';

@ApiTags('plot plans')
@Controller('trials/:trialId')
export class PlotsController {
  constructor(private readonly plots: PlotsService) {}

  @Get('plots')
  @AnyTrialMember()
  @ApiOkResponse({ type: [PlotDto], description: 'Plot[] in site, block and position order.' })
  list(@CurrentTrialAccess() access: TrialAccessContext, @Query() query: PlotsQueryDto) {
    return this.plots.list(access.trialId, query.siteId);
  }

  @Get('amounts')
  @AnyTrialMember()
  @ApiOkResponse({ type: [PlotAmountDto], description: 'PlotAmount[]: per site and treatment, the amount for one plot and for the site with the margin.' })
  amounts(@CurrentTrialAccess() access: TrialAccessContext, @Query() query: AmountsQueryDto) {
    return this.plots.amounts(access.trialId, query.marginPercent ?? 10);
  }

  @Get('level-amounts')
  @AnyTrialMember()
  @ApiOkResponse({
    type: [LevelAmountDto],
    description:
      'LevelAmount[] (factorial and split-plot trials): per site and factor level, the amount for one unit the level is applied to (a plot, or a whole plot of a split plot) and for all of them with the margin. Empty for one-factor designs.',
  })
  levelAmounts(@CurrentTrialAccess() access: TrialAccessContext, @Query() query: AmountsQueryDto) {
    return this.plots.levelAmounts(access.trialId, query.marginPercent ?? 10);
  }

  @Get('sites/:siteId/rounds/:roundId/template.csv')
  @AnyTrialMember()
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @ApiFileResponse(['text/csv'], "The site's plots of the round, one row each, with a column per measure to fill in.")
  @ApiConflictResponse({ description: 'The site is not randomized yet.' })
  async template(
    @CurrentTrialAccess() access: TrialAccessContext,
    @Param('siteId', ParseIntPipe) siteId: number,
    @Param('roundId', ParseIntPipe) roundId: number,
    @Res({ passthrough: true }) response: Response,
  ) {
    const { filename, csv } = await this.plots.template(access.trialId, siteId, roundId);
    response.setHeader('Content-Disposition', `attachment; filename="${filename}"`);
    return csv;
  }

  @Get('sites/:siteId/rounds/:roundId/template.xlsx')
  @AnyTrialMember()
  @ApiFileResponse(
    [XLSX_MEDIA_TYPE],
    "The same data sheet as a workbook: the plots' label, block and treatment locked (sheet protection, no password), each measure's cells checked as they are typed (its limits, NA, >cut-off).",
  )
  @ApiConflictResponse({ description: 'The site is not randomized yet.' })
  async templateWorkbook(@CurrentTrialAccess() access: TrialAccessContext, @Param('siteId', ParseIntPipe) siteId: number, @Param('roundId', ParseIntPipe) roundId: number): Promise<StreamableFile> {
    const { filename, bytes } = await this.plots.templateWorkbook(access.trialId, siteId, roundId);
    return new StreamableFile(bytes, { type: XLSX_MEDIA_TYPE, length: bytes.length, disposition: `attachment; filename="${filename}"` });
  }
}
