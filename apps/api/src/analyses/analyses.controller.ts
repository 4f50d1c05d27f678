import { Body, Controller, Get, HttpCode, Param, ParseIntPipe, Post } from '@nestjs/common';
import { ApiConflictResponse, ApiCreatedResponse, ApiOkResponse, ApiOperation, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import type { AuthUser, TrialAccessContext } from '../auth/auth-user';
import { AnyTrialMember, TrialAccess } from '../common/decorators/access.decorator';
import { CurrentTrialAccess, CurrentUser } from '../common/decorators/current-user.decorator';
import { AnalysesService } from './analyses.service';
import { CreateAnalysisDto } from './dto/create-analysis.dto';
import { CreateCommentDto } from './dto/create-comment.dto';
import { AnalysisSnapshotDto, AnalysisSnapshotSummaryDto, SnapshotCommentDto } from './dto/analysis-snapshot.dto';

@ApiTags('analyses')
@Controller('trials/:trialId/analyses')
export class AnalysesController {
  constructor(private readonly analyses: AnalysesService) {}

  @Post()
  @TrialAccess('investigator', 'reviewer')
  @ApiOperation({ summary: 'Save this analysis: the choices, the SHA-256 of the data used, the engine version and the full Findings, frozen' })
  @ApiCreatedResponse({ type: AnalysisSnapshotDto, description: 'AnalysisSnapshot (dataChanged false).' })
  @ApiUnprocessableEntityResponse({ description: 'A choice refused by name, no data, or the engine’s sentence.' })
  create(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Body() body: CreateAnalysisDto) {
    return this.analyses.create(access.trialId, user, body);
  }

  @Get()
  @AnyTrialMember()
  @ApiOkResponse({ type: [AnalysisSnapshotSummaryDto], description: 'AnalysisSnapshotSummary[], newest first (without the result).' })
  list(@CurrentTrialAccess() access: TrialAccessContext) {
    return this.analyses.list(access.trialId);
  }

  @Get(':analysisId')
  @AnyTrialMember()
  @ApiOkResponse({ type: AnalysisSnapshotDto, description: 'AnalysisSnapshot: the stored result, never recomputed, with dataChanged when today’s data hash differs.' })
  get(@CurrentTrialAccess() access: TrialAccessContext, @Param('analysisId', ParseIntPipe) analysisId: number) {
    return this.analyses.get(access.trialId, analysisId);
  }

  @Get(':analysisId/comments')
  @AnyTrialMember()
  @ApiOkResponse({ type: [SnapshotCommentDto], description: 'SnapshotComment[], oldest first.' })
  comments(@CurrentTrialAccess() access: TrialAccessContext, @Param('analysisId', ParseIntPipe) analysisId: number) {
    return this.analyses.listComments(access.trialId, analysisId);
  }

  @Post(':analysisId/comments')
  @AnyTrialMember()
  @ApiCreatedResponse({ type: SnapshotCommentDto, description: 'SnapshotComment; recorded in the activity log.' })
  comment(
    @CurrentTrialAccess() access: TrialAccessContext,
    @CurrentUser() user: AuthUser,
    @Param('analysisId', ParseIntPipe) analysisId: number,
    @Body() body: CreateCommentDto,
  ) {
    return this.analyses.comment(access.trialId, analysisId, user, body.body);
  }

  @Post(':analysisId/sign-off')
  @TrialAccess('investigator')
  @HttpCode(200)
  @ApiOkResponse({ type: AnalysisSnapshotDto, description: 'AnalysisSnapshot with signedOffAt and signedOffBy; recorded in the activity log.' })
  @ApiConflictResponse({ description: 'The trial is not locked, or the analysis is already signed off (a sentence).' })
  signOff(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Param('analysisId', ParseIntPipe) analysisId: number) {
    return this.analyses.signOff(access.trialId, analysisId, user);
  }
}
