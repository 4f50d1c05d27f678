import {
  SIGN_OFF_STATES,
  TRIAL_ROLES,
  type CommentDeleteInput,
  type CommentInput,
  type CommentRevision,
  type CommentUpdateInput,
  type ReportReview,
  type ReviewRequestAnswer,
  type ReviewRequestInput,
  type ReviewStatus,
  type SignOff,
  type SignOffAmendInput,
  type SignOffInput,
  type SignOffWithdrawInput,
  type SignOffState,
  type TrialRole,
} from '@friable/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { EditVersionDto } from '../../protocol-gate/edit-version';
import { IsBoolean, IsInt, IsOptional, IsString, Matches, MaxLength, Min } from 'class-validator';

export class SignOffDto implements SignOff {
  @ApiProperty()
  id: number;

  @ApiProperty()
  analysisId: number;

  @ApiProperty({ type: Number, nullable: true })
  userId: number | null;

  @ApiProperty({ description: 'The signer’s name when they signed.' })
  name: string;

  @ApiProperty({ enum: TRIAL_ROLES, enumName: 'TrialRole' })
  role: TrialRole;

  @ApiProperty()
  statement: string;

  @ApiProperty({ format: 'date-time' })
  signedAt: string;

  @ApiProperty({ description: 'SHA-256 of the data the analysis used when signed.' })
  dataHash: string;

  @ApiProperty()
  engineVersion: string;

  @ApiProperty({
    enum: SIGN_OFF_STATES,
    enumName: 'SignOffState',
    description: '`data-changed`: the trial’s data moved on after this sign-off; `withdrawn`: its author took it back (it no longer counts).',
  })
  state: SignOffState;

  @ApiProperty({ example: 1, description: 'The edit version: sent back with an amendment or the withdrawal.' })
  version: number;

  @ApiProperty({ type: String, format: 'date-time', nullable: true, description: 'When its author last amended the statement.' })
  amendedAt: string | null;

  @ApiProperty({ type: String, format: 'date-time', nullable: true })
  withdrawnAt: string | null;

  @ApiProperty({ type: String, nullable: true })
  withdrawalReason: string | null;
}

export class ReviewStatusDto implements ReviewStatus {
  @ApiProperty({ enum: ['reviewer', 'investigator'], description: 'The trial’s reviewers sign; its investigators when it has no reviewer.' })
  expectedRole: 'reviewer' | 'investigator';

  @ApiProperty()
  expected: number;

  @ApiProperty()
  signed: number;

  @ApiProperty({ example: 'Signed by 1 of 2 reviewers' })
  label: string;

  @ApiProperty({ type: [String] })
  awaiting: string[];

  @ApiProperty({ type: String, format: 'date-time', nullable: true })
  lastRequestedAt: string | null;
}

export class CommentRevisionDto implements CommentRevision {
  @ApiProperty({ enum: ['edited', 'deleted'] })
  kind: 'edited' | 'deleted';

  @ApiProperty({ description: 'The text as it was before this change.' })
  body: string;

  @ApiProperty({ format: 'date-time' })
  at: string;

  @ApiProperty({ type: String, nullable: true })
  byName: string | null;
}

export class ReviewRequestAnswerDto implements ReviewRequestAnswer {
  @ApiProperty({ type: [String], description: 'The reviewers who were e-mailed.' })
  notified: string[];

  @ApiProperty({ format: 'date-time' })
  requestedAt: string;
}

export class ReportOpenCommentDto {
  @ApiProperty()
  id: number;

  @ApiProperty({ type: String, nullable: true })
  authorName: string | null;

  @ApiProperty()
  body: string;

  @ApiProperty({ format: 'date-time' })
  createdAt: string;

  @ApiProperty()
  replyCount: number;
}

export class ReportReviewDto implements ReportReview {
  @ApiProperty()
  analysisId: number;

  @ApiProperty()
  title: string;

  @ApiProperty()
  measureName: string;

  @ApiProperty()
  roundLabel: string;

  @ApiProperty()
  scopeLabel: string;

  @ApiProperty({ type: ReviewStatusDto })
  review: ReviewStatusDto;

  @ApiProperty({ type: [SignOffDto] })
  signOffs: SignOffDto[];

  @ApiProperty({ type: [ReportOpenCommentDto] })
  openComments: ReportOpenCommentDto[];
}

const STATEMENT = 'statement must be text of 1 to 1000 characters';
const BODY = 'body must be text of 1 to 4000 characters';

/** POST /api/trials/:trialId/analyses/:analysisId/sign-offs. */
export class SignOffInputDto implements SignOffInput {
  @ApiProperty({ example: 'I checked the layout, the data at both sites and the model; the conclusions follow from them.' })
  @IsString({ message: STATEMENT })
  @Matches(/\S/, { message: STATEMENT })
  @MaxLength(1000, { message: STATEMENT })
  statement: string;
}

/** PATCH /api/trials/:trialId/analyses/:analysisId/sign-offs/:signOffId — the author's new statement. */
export class SignOffAmendDto extends EditVersionDto implements SignOffAmendInput {
  @ApiProperty({ example: 'I checked the layout, the data at both sites and the model again after the plot notes were added.' })
  @IsString({ message: STATEMENT })
  @Matches(/\S/, { message: STATEMENT })
  @MaxLength(1000, { message: STATEMENT })
  statement: string;
}

const REASON = 'reason must be text of 1 to 1000 characters';

/** DELETE /api/trials/:trialId/analyses/:analysisId/sign-offs/:signOffId — why the author takes it back. */
export class SignOffWithdrawDto extends EditVersionDto implements SignOffWithdrawInput {
  @ApiProperty({ example: 'The drainage notes for block 2 arrived after I signed; I want to read them first.' })
  @IsString({ message: REASON })
  @Matches(/\S/, { message: REASON })
  @MaxLength(1000, { message: REASON })
  reason: string;
}

/** POST /api/trials/:trialId/analyses/:analysisId/review-requests. */
export class ReviewRequestInputDto implements ReviewRequestInput {
  @ApiPropertyOptional({ type: String, nullable: true, description: 'A note for the reviewers, included in the e-mail.' })
  @IsOptional()
  @IsString({ message: 'message must be text of at most 2000 characters' })
  @MaxLength(2000, { message: 'message must be text of at most 2000 characters' })
  message?: string | null;
}

/** POST /api/trials/:trialId/analyses/:analysisId/comments; `parentId` makes it a reply. */
export class CommentInputDto implements CommentInput {
  @ApiProperty({ example: 'The gypsum plots at Quarry Hill drained oddly fast; worth a look at the plot notes.' })
  @IsString({ message: BODY })
  @Matches(/\S/, { message: BODY })
  @MaxLength(4000, { message: BODY })
  body: string;

  @ApiPropertyOptional({ type: Number, nullable: true, description: 'The comment this one answers.' })
  @IsOptional()
  @IsInt({ message: 'parentId must be the id of a comment on this analysis' })
  @Min(1, { message: 'parentId must be the id of a comment on this analysis' })
  parentId?: number | null;
}

/** PATCH /api/trials/:trialId/analyses/:analysisId/comments/:commentId. */
export class CommentUpdateDto extends EditVersionDto implements CommentUpdateInput {
  @ApiPropertyOptional({ description: 'New text (the author only); the old text is kept as "edited".' })
  @IsOptional()
  @IsString({ message: BODY })
  @Matches(/\S/, { message: BODY })
  @MaxLength(4000, { message: BODY })
  body?: string;

  @ApiPropertyOptional({ description: 'Mark the thread resolved, or open it again.' })
  @IsOptional()
  @IsBoolean({ message: 'resolved must be true or false' })
  resolved?: boolean;
}

/** DELETE /api/trials/:trialId/analyses/:analysisId/comments/:commentId — the version the author saw. */
export class CommentDeleteDto extends EditVersionDto implements CommentDeleteInput {}
