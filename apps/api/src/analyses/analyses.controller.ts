import { Body, Controller, Delete, Get, HttpCode, Param, ParseIntPipe, Patch, Post } from '@nestjs/common';
import {
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
  ApiUnprocessableEntityResponse,
} from '@nestjs/swagger';
import type { AuthUser, TrialAccessContext } from '../common/auth-user';
import { AnyTrialMember, TrialAccess } from '../common/decorators/access.decorator';
import { CurrentTrialAccess, CurrentUser } from '../common/decorators/current-user.decorator';
import { AnalysesService } from './analyses.service';
import { CommentsService } from './comments.service';
import { CreateAnalysisDto } from './dto/create-analysis.dto';
import { AnalysisSnapshotDto, AnalysisSnapshotSummaryDto, SnapshotCommentDto } from './dto/analysis-snapshot.dto';
import {
  CommentDeleteDto,
  CommentInputDto,
  CommentUpdateDto,
  ReviewRequestAnswerDto,
  ReviewRequestInputDto,
  SignOffAmendDto,
  SignOffDto,
  SignOffInputDto,
  SignOffWithdrawDto,
} from './dto/review.dto';
import { StaleEditAnswers } from '../protocol-gate/edit-version';
import { ReviewService } from './review.service';

@ApiTags('analyses')
@Controller('trials/:trialId/analyses')
export class AnalysesController {
  constructor(
    private readonly analyses: AnalysesService,
    private readonly review: ReviewService,
    private readonly comments: CommentsService,
  ) {}

  @Post()
  @TrialAccess('investigator', 'reviewer')
  @ApiOperation({ summary: 'Save this analysis — the classical ANOVA or any model Findings offers (censored, repeated, ancova, ordinal, counts): the choices, the SHA-256 of the data used, the engine version and the full Findings answer, frozen' })
  @ApiCreatedResponse({ type: AnalysisSnapshotDto, description: 'AnalysisSnapshot (dataChanged false).' })
  @ApiUnprocessableEntityResponse({ description: 'A choice refused by name, no data, or the engine’s sentence.' })
  create(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Body() body: CreateAnalysisDto) {
    return this.analyses.create(access.trialId, user, body);
  }

  @Get()
  @AnyTrialMember()
  @ApiOkResponse({ type: [AnalysisSnapshotSummaryDto], description: 'AnalysisSnapshotSummary[], newest first (without the result), each with its sign-offs and review status.' })
  list(@CurrentTrialAccess() access: TrialAccessContext) {
    return this.analyses.list(access.trialId);
  }

  @Get(':analysisId')
  @AnyTrialMember()
  @ApiOkResponse({ type: AnalysisSnapshotDto, description: 'AnalysisSnapshot: the stored result, never recomputed, with dataChanged when today’s data hash differs.' })
  get(@CurrentTrialAccess() access: TrialAccessContext, @Param('analysisId', ParseIntPipe) analysisId: number) {
    return this.analyses.get(access.trialId, analysisId);
  }

  @Post(':analysisId/sign-offs')
  @TrialAccess('investigator', 'reviewer')
  @ApiOperation({ summary: 'Sign off a saved analysis of a locked trial with a short statement (a reviewer; an investigator when the trial has no reviewer)' })
  @ApiCreatedResponse({ type: SignOffDto, description: 'SignOff: name, role, time, statement, data hash and engine version; recorded in the activity trail.' })
  @ApiConflictResponse({ description: 'The trial is not locked, the data changed since the analysis was saved, or you already signed it (a sentence).' })
  signOff(
    @CurrentTrialAccess() access: TrialAccessContext,
    @CurrentUser() user: AuthUser,
    @Param('analysisId', ParseIntPipe) analysisId: number,
    @Body() body: SignOffInputDto,
  ) {
    return this.review.signOff(access, analysisId, user, body.statement);
  }

  @Patch(':analysisId/sign-offs/:signOffId')
  @TrialAccess('investigator', 'reviewer')
  @ApiOperation({ summary: 'The signer amends the statement of their standing sign-off, sending the version they read (the earlier text stays in the activity trail)' })
  @ApiOkResponse({ type: SignOffDto })
  @StaleEditAnswers(SignOffDto, 'a sentence: the sign-off was withdrawn, or the data changed after it.')
  amendSignOff(
    @CurrentTrialAccess() access: TrialAccessContext,
    @CurrentUser() user: AuthUser,
    @Param('analysisId', ParseIntPipe) analysisId: number,
    @Param('signOffId', ParseIntPipe) signOffId: number,
    @Body() body: SignOffAmendDto,
  ) {
    return this.review.amend(access.trialId, analysisId, signOffId, user, body);
  }

  @Delete(':analysisId/sign-offs/:signOffId')
  @TrialAccess('investigator', 'reviewer')
  @ApiOperation({ summary: 'The signer withdraws their sign-off with a reason and the version they read: it stays on the record as withdrawn and no longer counts' })
  @ApiOkResponse({ type: SignOffDto, description: 'The sign-off, now withdrawn.' })
  @StaleEditAnswers(SignOffDto, 'a sentence: it was already withdrawn.')
  withdrawSignOff(
    @CurrentTrialAccess() access: TrialAccessContext,
    @CurrentUser() user: AuthUser,
    @Param('analysisId', ParseIntPipe) analysisId: number,
    @Param('signOffId', ParseIntPipe) signOffId: number,
    @Body() body: SignOffWithdrawDto,
  ) {
    return this.review.withdraw(access.trialId, analysisId, signOffId, user, body);
  }

  @Post(':analysisId/review-requests')
  @TrialAccess('investigator')
  @ApiOperation({ summary: 'Ask the trial’s reviewers to review a saved analysis: each gets an e-mail with a link to it' })
  @ApiCreatedResponse({ type: ReviewRequestAnswerDto })
  @ApiConflictResponse({ description: 'The trial has no reviewer yet.' })
  requestReview(
    @CurrentTrialAccess() access: TrialAccessContext,
    @CurrentUser() user: AuthUser,
    @Param('analysisId', ParseIntPipe) analysisId: number,
    @Body() body: ReviewRequestInputDto,
  ) {
    return this.review.requestReview(access.trialId, analysisId, user, body.message);
  }

  @Get(':analysisId/comments')
  @AnyTrialMember()
  @ApiOkResponse({ type: [SnapshotCommentDto], description: 'SnapshotComment[], oldest first; replies carry parentId; deleted ones keep their place with an empty body.' })
  listComments(@CurrentTrialAccess() access: TrialAccessContext, @Param('analysisId', ParseIntPipe) analysisId: number) {
    return this.comments.list(access.trialId, analysisId);
  }

  @Post(':analysisId/comments')
  @AnyTrialMember()
  @ApiCreatedResponse({ type: SnapshotCommentDto, description: 'SnapshotComment; a reply is e-mailed to the reviewers and the thread’s author; recorded in the activity trail.' })
  @ApiUnprocessableEntityResponse({ description: 'body empty or too long, or parentId not a comment of this analysis.' })
  addComment(
    @CurrentTrialAccess() access: TrialAccessContext,
    @CurrentUser() user: AuthUser,
    @Param('analysisId', ParseIntPipe) analysisId: number,
    @Body() body: CommentInputDto,
  ) {
    return this.comments.add(access.trialId, analysisId, user, body);
  }

  @Patch(':analysisId/comments/:commentId')
  @AnyTrialMember()
  @ApiOperation({ summary: 'Edit one’s own comment (the old text kept as "edited"), or mark a thread resolved / open again, sending the version read' })
  @ApiOkResponse({ type: SnapshotCommentDto })
  @StaleEditAnswers(SnapshotCommentDto, 'a sentence: the comment was deleted.')
  updateComment(
    @CurrentTrialAccess() access: TrialAccessContext,
    @CurrentUser() user: AuthUser,
    @Param('analysisId', ParseIntPipe) analysisId: number,
    @Param('commentId', ParseIntPipe) commentId: number,
    @Body() body: CommentUpdateDto,
  ) {
    return this.comments.update(access, analysisId, commentId, user, body);
  }

  @Delete(':analysisId/comments/:commentId')
  @AnyTrialMember()
  @HttpCode(204)
  @ApiOperation({ summary: 'Delete one’s own comment, sending the version read: it shows as deleted, its text kept in history; replies stay' })
  @ApiNoContentResponse({ description: 'Deleted.' })
  @StaleEditAnswers(SnapshotCommentDto, 'a sentence: it was already deleted.')
  async deleteComment(
    @CurrentTrialAccess() access: TrialAccessContext,
    @CurrentUser() user: AuthUser,
    @Param('analysisId', ParseIntPipe) analysisId: number,
    @Param('commentId', ParseIntPipe) commentId: number,
    @Body() body: CommentDeleteDto,
  ): Promise<void> {
    await this.comments.remove(access.trialId, analysisId, commentId, user, body.version);
  }
}
