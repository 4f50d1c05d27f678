import { AFT_DISTRIBUTIONS, type AftDistribution } from '@friable/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { ControlRatioDto, LikelihoodRatioTestDto, ModelCoefficientDto } from './model-answer-parts.dto';

class LogRankDto {
  @ApiProperty({ example: 14.2 })
  chiSquare: number;
  @ApiProperty({ example: 4 })
  df: number;
  @ApiProperty({ example: 0.0067 })
  p: number;
  @ApiProperty({ example: 14, description: 'Number of strata (blocks, or site × block) the test was summed over.' })
  strata: number;
}

class MedianTimeDto {
  @ApiProperty({ example: 'GYP' })
  treatment: string;
  @ApiProperty({ example: 212, nullable: true, type: Number, description: 'Null: not reached.' })
  median: number | null;
  @ApiProperty({ example: 150, nullable: true, type: Number })
  lower: number | null;
  @ApiProperty({ example: 300, nullable: true, type: Number })
  upper: number | null;
}

class CurvePointDto {
  @ApiProperty({ example: 212 })
  time: number;
  @ApiProperty({ example: 0.75, description: 'Share of plots not yet drained just after `time`.' })
  notDrained: number;
  @ApiProperty({ example: 0.52, nullable: true, type: Number })
  lower: number | null;
  @ApiProperty({ example: 1, nullable: true, type: Number })
  upper: number | null;
  @ApiProperty({ example: 12 })
  atRisk: number;
  @ApiProperty({ example: 1 })
  events: number;
  @ApiProperty({ example: 0 })
  censored: number;
}

class CurveDto {
  @ApiProperty({ example: 'GYP' })
  treatment: string;
  @ApiProperty({ type: [CurvePointDto] })
  points: CurvePointDto[];
}

class SiteCurvesDto {
  @ApiProperty({ example: 'Hollow Lane' })
  site: string;
  @ApiProperty({ type: [CurveDto] })
  curves: CurveDto[];
  @ApiProperty({ type: [MedianTimeDto] })
  medians: MedianTimeDto[];
}

class TreatmentCountDto {
  @ApiProperty({ example: 'GYP' })
  treatment: string;
  @ApiProperty({ example: 14 })
  plots: number;
  @ApiProperty({ example: 12 })
  drained: number;
  @ApiProperty({ example: 2 })
  notDrained: number;
}

/** OpenAPI schema of POST /api/stats/censored's answer. */
export class CensoredAnswerDto {
  @ApiProperty({ enum: AFT_DISTRIBUTIONS })
  distribution: AftDistribution;
  @ApiProperty({ nullable: true, type: Number, description: 'Null when the time-ratio model could not be fitted (warnings say why).' })
  logLik: number | null;
  @ApiProperty({ nullable: true, type: Number })
  scale: number | null;
  @ApiProperty({ type: [ModelCoefficientDto], description: 'Log-time coefficients (treatment contrasts against the control).' })
  coefficients: ModelCoefficientDto[];
  @ApiProperty({ type: [LikelihoodRatioTestDto] })
  tests: LikelihoodRatioTestDto[];
  @ApiProperty({ type: LogRankDto })
  logRank: LogRankDto;
  @ApiProperty({ type: [ControlRatioDto], description: 'Typical drain time relative to the control’s (below 1: faster).' })
  timeRatios: ControlRatioDto[];
  @ApiProperty({ type: [MedianTimeDto] })
  medians: MedianTimeDto[];
  @ApiProperty({ type: [CurveDto] })
  curves: CurveDto[];
  @ApiPropertyOptional({ type: [SiteCurvesDto], description: 'With several sites: each site’s curves and medians.' })
  bySite?: SiteCurvesDto[];
  @ApiProperty({ type: [TreatmentCountDto] })
  treatments: TreatmentCountDto[];
  @ApiProperty({ example: 'CTRL' })
  control: string;
  @ApiProperty({ description: 'How the comparisons with the control are adjusted, in words.' })
  adjustment: string;
  @ApiProperty({ type: [String] })
  warnings: string[];
}
