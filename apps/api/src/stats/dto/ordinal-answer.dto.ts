import { ApiProperty } from '@nestjs/swagger';
import { ControlRatioDto, LikelihoodRatioTestDto, ModelCoefficientDto, ModelRankTestDto } from './model-answer-parts.dto';

class ThresholdDto {
  @ApiProperty({ example: '2|3', description: 'The cut-point between two neighbouring scores (logit scale).' })
  between: string;
  @ApiProperty({ example: -0.4 })
  estimate: number;
  @ApiProperty({ example: 0.3 })
  se: number;
}

class CategoryShareDto {
  @ApiProperty({ example: 'CMP' })
  treatment: string;
  @ApiProperty({ example: '4' })
  category: string;
  @ApiProperty({ example: 0.41, description: 'Predicted share of plots with this score, averaged over blocks.' })
  probability: number;
  @ApiProperty({ example: 0.08, description: 'Delta-method standard error.' })
  se: number;
}

/** OpenAPI schema of POST /api/stats/ordinal's answer. */
export class OrdinalAnswerDto {
  @ApiProperty({ type: [String], example: ['1', '2', '3', '4', '5'] })
  categories: string[];
  @ApiProperty()
  logLik: number;
  @ApiProperty({ type: [ThresholdDto] })
  thresholds: ThresholdDto[];
  @ApiProperty({ type: [ModelCoefficientDto], description: 'Log-odds of a higher score (treatment contrasts against the control).' })
  coefficients: ModelCoefficientDto[];
  @ApiProperty({ type: [LikelihoodRatioTestDto] })
  tests: LikelihoodRatioTestDto[];
  @ApiProperty({ type: [ControlRatioDto], description: 'Odds of a higher score than the control’s.' })
  oddsRatios: ControlRatioDto[];
  @ApiProperty({ type: [CategoryShareDto] })
  probabilities: CategoryShareDto[];
  @ApiProperty({ type: ModelRankTestDto })
  rankTest: ModelRankTestDto;
  @ApiProperty({ example: 'CTRL' })
  control: string;
  @ApiProperty()
  adjustment: string;
  @ApiProperty({ type: [String] })
  warnings: string[];
}
