import type { AnalysisSnapshot, AnalysisSnapshotSummary, SnapshotComment } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { FindingsChoicesDto, FindingsDto } from '../../findings/dto/findings.dto';

export class AnalysisSnapshotSummaryDto implements AnalysisSnapshotSummary {
  @ApiProperty()
  id: number;

  @ApiProperty()
  trialId: number;

  @ApiProperty()
  title: string;

  @ApiProperty({ type: FindingsChoicesDto })
  choices: FindingsChoicesDto;

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
}

/** The stored result, never recomputed. */
export class AnalysisSnapshotDto extends AnalysisSnapshotSummaryDto implements AnalysisSnapshot {
  @ApiProperty({ type: FindingsDto })
  result: FindingsDto;

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

  @ApiProperty()
  body: string;

  @ApiProperty({ type: Number, nullable: true })
  authorId: number | null;

  @ApiProperty({ type: String, nullable: true })
  authorName: string | null;

  @ApiProperty({ format: 'date-time' })
  createdAt: string;
}
