import type { IntakeResult } from '@friable/contracts';
import { Body, Controller, HttpCode, Param, ParseIntPipe, Post, Query, UnprocessableEntityException, UploadedFile, UseInterceptors } from '@nestjs/common';
import { ApiBody, ApiConflictResponse, ApiExtraModels, getSchemaPath, ApiConsumes, ApiOkResponse, ApiPayloadTooLargeResponse, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import type { AuthUser, TrialAccessContext } from '../common/auth-user';
import { TrialAccess } from '../common/decorators/access.decorator';
import { CurrentTrialAccess, CurrentUser } from '../common/decorators/current-user.decorator';
import { SingleFileUpload } from '../storage/single-file-upload.interceptor';
import { IntakeOptionsDto, flagIsSet, readMapping } from './dto/intake-options.dto';
import { intakeConfig } from './intake.config';
import { IntakeService } from './intake.service';
import { IntakeRefusalDto, IntakeResultDto } from './dto/intake-responses.dto';
import { ProblemDto } from '../common/dto/problem.dto';

@ApiExtraModels(IntakeRefusalDto, ProblemDto)
@ApiTags('intake')
@Controller('trials/:trialId/sites/:siteId/rounds/:roundId/intake')
export class IntakeController {
  constructor(private readonly intake: IntakeService) {}

  @Post()
  @HttpCode(200)
  @TrialAccess('investigator', 'collaborator')
  @UseInterceptors(SingleFileUpload({ field: 'file', configToken: intakeConfig.KEY, what: 'an upload', storage: 'disk' }))
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['file'],
      properties: {
        file: {
          type: 'string',
          format: 'binary',
          description: 'The CSV file (UTF-8; comma, semicolon or tab) or .xlsx workbook, as the site and round template. Up to INTAKE_MAX_BYTES (100 MB by default).',
        },
        acceptWarnings: { type: 'string', enum: ['true', 'false'], description: 'Keep values outside the usual range as typed.' },
        mapping: { type: 'string', description: 'JSON: column header → plotLabel, block, treatment, notes, missingReason, a measure code, notes:<measure code> (that measure’s own notes), or null.' },
        ticket: { type: 'string', description: 'Your name for this upload, to follow its progress at /api/trials/:trialId/intake-imports/:ticket.' },
        sheet: { type: 'string', description: 'For a workbook: the sheet to read; the first visible one by default.' },
      },
    },
  })
  @ApiOkResponse({ type: IntakeResultDto, description: 'IntakeResult: what was written (or, with ?dryRun=true, what would be): new, changed and unchanged values.' })
  @ApiUnprocessableEntityResponse({ schema: { anyOf: [{ $ref: getSchemaPath(IntakeRefusalDto) }, { $ref: getSchemaPath(ProblemDto) }] }, description: 'IntakeRefusal: nothing was written; errors lists every problem by row and column (or the warnings to accept).' })
  @ApiPayloadTooLargeResponse({ description: 'The file is larger than INTAKE_MAX_BYTES (100 MB by default, enough for a million rows of the template).' })
  @ApiConflictResponse({ description: 'The trial is locked, or the site is not randomized yet.' })
  upload(
    @CurrentTrialAccess() access: TrialAccessContext,
    @CurrentUser() user: AuthUser,
    @Param('siteId', ParseIntPipe) siteId: number,
    @Param('roundId', ParseIntPipe) roundId: number,
    @Query() query: IntakeOptionsDto,
    @Body() body: IntakeOptionsDto,
    @UploadedFile() file: Express.Multer.File | undefined,
  ): Promise<IntakeResult> {
    if (!file) throw new UnprocessableEntityException('Send the CSV file or workbook as multipart/form-data in the form field "file".');
    const mapping = readMapping(body.mapping);
    if (typeof mapping === 'string') {
      throw new UnprocessableEntityException({ statusCode: 422, error: 'Unprocessable Entity', message: `Please correct: ${mapping}.`, errors: [{ field: 'mapping', message: mapping }] });
    }
    return this.intake.intake(access, user, siteId, roundId, { source: { path: file.path, size: file.size }, fileName: file.originalname || 'upload.csv' }, {
      dryRun: flagIsSet(query.dryRun ?? body.dryRun),
      acceptWarnings: flagIsSet(query.acceptWarnings ?? body.acceptWarnings),
      columnOverrides: mapping,
      missingReason: body.missingReason?.trim() || null,
      ticket: body.ticket ?? query.ticket,
      sheet: body.sheet ?? query.sheet ?? null,
    });
  }
}
