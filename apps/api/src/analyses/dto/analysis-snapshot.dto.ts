import type { AnalysisSnapshot, AnalysisSnapshotSummary, FindingsAnswer, SavedAnalysisChoices, SnapshotComment } from '@friable/contracts';
import { ApiExtraModels, ApiProperty, getSchemaPath, IntersectionType, PickType } from '@nestjs/swagger';
import { FindingsChoicesDto, FindingsDto } from '../../findings/dto/findings.dto';
import { AncovaFindingsDto, CensoredFindingsDto, CountsFindingsDto, ModelChoicesDto, OrdinalFindingsDto, RepeatedFindingsDto } from '../../findings/dto/model-findings.dto';
import { CommentRevisionDto, ReviewStatusDto, SignOffDto } from './review.dto';

/** The choices of a saved analysis: the ANOVA's, the analysis and its model options. */
export class SavedAnalysisChoicesDto
  extends IntersectionType(FindingsChoicesDto, PickType(ModelChoicesDto, ['analysis', 'distribution', 'covariance', 'family', 'covariateMeasureId', 'covariateRoundId'] as const))
  implements SavedAnalysisChoices {}

export class AnalysisSnapshotSummaryDto implements AnalysisSnapshotSummary {
  @ApiProperty()
  id: number;

  @ApiProperty()
  trialId: number;

  @ApiProperty()
  title: string;

  @ApiProperty({ type: SavedAnalysisChoicesDto })
  choices: SavedAnalysisChoicesDto;

  @ApiProperty({ example: 'Not-drained curves and time ratios', description: 'Friable’s name of the analysis saved.' })
  analysisLabel: string;

  @ApiProperty()
  measureName: string;

  @ApiProperty()
  roundLabel: string;

  @ApiProperty()
  scopeLabel: string;

  @ApiProperty()
  dataHash: string;

  @ApiProperty()
  engineVersion: string;

  @ApiProperty({ type: Number, nullable: true })
  createdById: number | null;

  @ApiProperty({ type: String, nullable: true })
  createdBy: string | null;

  @ApiProperty({ format: 'date-time' })
  createdAt: string;

  @ApiProperty({ type: String, format: 'date-time', nullable: true })
  signedOffAt: string | null;

  @ApiProperty({ type: Number, nullable: true })
  signedOffById: number | null;

  @ApiProperty({ type: String, nullable: true })
  signedOffBy: string | null;

  @ApiProperty()
  commentCount: number;

  @ApiProperty({ type: [SignOffDto], description: 'Every sign-off, oldest first.' })
  signOffs: SignOffDto[];

  @ApiProperty({ type: ReviewStatusDto })
  review: ReviewStatusDto;
}

const RESULTS = [FindingsDto, CensoredFindingsDto, RepeatedFindingsDto, AncovaFindingsDto, OrdinalFindingsDto, CountsFindingsDto];

/** The stored result, never recomputed. */
@ApiExtraModels(...RESULTS)
export class AnalysisSnapshotDto extends AnalysisSnapshotSummaryDto implements AnalysisSnapshot {
  @ApiProperty({ anyOf: RESULTS.map((result) => ({ $ref: getSchemaPath(result) })), description: 'The Findings answer as it was saved: the classical ANOVA, or a model’s answer with `analysis`.' })
  result: FindingsAnswer;

  @ApiProperty({ description: "True when the current data's hash differs from dataHash." })
  dataChanged: boolean;

  @ApiProperty({ type: String, nullable: true })
  currentDataHash: string | null;
}

export class SnapshotCommentDto implements SnapshotComment {
  @ApiProperty()
  id: number;

  @ApiProperty()
  analysisId: number;

  @ApiProperty({ type: Number, nullable: true, description: 'The comment this one replies to.' })
  parentId: number | null;

  @ApiProperty({ description: 'Empty once deleted (the earlier text stays in revisions).' })
  body: string;

  @ApiProperty({ type: Number, nullable: true })
  authorId: number | null;

  @ApiProperty({ type: String, nullable: true })
  authorName: string | null;

  @ApiProperty({ format: 'date-time' })
  createdAt: string;

  @ApiProperty({ type: String, format: 'date-time', nullable: true })
  editedAt: string | null;

  @ApiProperty({ type: String, format: 'date-time', nullable: true })
  deletedAt: string | null;

  @ApiProperty({ type: String, format: 'date-time', nullable: true })
  resolvedAt: string | null;

  @ApiProperty({ type: String, nullable: true })
  resolvedByName: string | null;

  @ApiProperty({ type: [CommentRevisionDto], description: 'Earlier texts, oldest first.' })
  revisions: CommentRevisionDto[];

  @ApiProperty({ example: 1, description: 'The edit version: sent back with an edit, a resolution or the deletion.' })
  version: number;
}
