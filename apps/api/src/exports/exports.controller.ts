import { Controller, Get, Header, Res, StreamableFile } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import type { TrialAccessContext } from '../common/auth-user';
import { AnyTrialMember } from '../common/decorators/access.decorator';
import { CurrentTrialAccess } from '../common/decorators/current-user.decorator';
import { ExportsService } from './exports.service';
import { ApiFileResponse, XLSX_MEDIA_TYPE } from '../common/openapi/file-response.decorator';


@ApiTags('exports')
@Controller('trials/:trialId')
export class ExportsController {
  constructor(private readonly exports: ExportsService) {}

  @Get('export.csv')
  @AnyTrialMember()
  @ApiOperation({ summary: 'Tidy CSV: one row per stored value (plot × round × measure), text cells safe from spreadsheet formulas' })
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @ApiFileResponse(['text/csv'], 'Columns: trial, site, block, plot_label, treatment, round, measure, unit, value, censored, censor_limit, missing_reason, notes, recorded_by, recorded_at.')
  async csv(@CurrentTrialAccess() access: TrialAccessContext, @Res({ passthrough: true }) response: Response) {
    const { filename, csv } = await this.exports.csv(access.trialId);
    response.setHeader('Content-Disposition', `attachment; filename="${filename}"`);
    return csv;
  }

  @Get('export-dictionary.csv')
  @AnyTrialMember()
  @ApiOperation({ summary: 'The data dictionary of export.csv: column, meaning, type' })
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @ApiFileResponse(['text/csv'], 'Columns: column, meaning, type.')
  async dictionary(@CurrentTrialAccess() access: TrialAccessContext, @Res({ passthrough: true }) response: Response) {
    const { filename, csv } = await this.exports.dictionaryCsv(access.trialId);
    response.setHeader('Content-Disposition', `attachment; filename="${filename}"`);
    return csv;
  }

  @Get('export.xlsx')
  @AnyTrialMember()
  @ApiOperation({ summary: 'Workbook: Protocol, Plot plans, Data, Dictionary and one sheet per saved analysis ("Analysis <id>")' })
  @ApiFileResponse([XLSX_MEDIA_TYPE], 'The workbook, saved under the trial code and date.')
  async workbook(@CurrentTrialAccess() access: TrialAccessContext) {
    const { filename, bytes } = await this.exports.workbook(access.trialId);
    return new StreamableFile(bytes, { type: XLSX_MEDIA_TYPE, length: bytes.length, disposition: `attachment; filename="${filename}"` });
  }
}
