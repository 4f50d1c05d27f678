import { ApiProperty } from '@nestjs/swagger';
import { ControlRatioDto, ModelCoefficientDto } from './model-answer-parts.dto';

class OverdispersionDto {
  @ApiProperty({ example: 99.5 })
  pearsonChiSquare: number;
  @ApiProperty({ example: 66 })
  df: number;
  @ApiProperty({ example: 0.0048 })
  p: number;
  @ApiProperty({ example: true })
  present: boolean;
}

class CountTermTestDto {
  @ApiProperty({ example: 'treatment' })
  term: string;
  @ApiProperty({ example: 4 })
  df: number;
  @ApiProperty({ example: 31.2, description: 'Deviance explained by the term.' })
  deviance: number;
  @ApiProperty({ nullable: true, type: Number, description: 'Poisson: the deviance as χ².' })
  chiSquare: number | null;
  @ApiProperty({ nullable: true, type: Number, description: 'Quasi-Poisson: F against the dispersion.' })
  f: number | null;
  @ApiProperty({ nullable: true, type: Number })
  denDf: number | null;
  @ApiProperty({ nullable: true, type: Number })
  p: number | null;
}

class CountRateDto {
  @ApiProperty({ example: 'CMP' })
  treatment: string;
  @ApiProperty({ example: 12.4, description: 'The model’s count per plot, averaged over blocks on the log scale.' })
  rate: number;
  @ApiProperty({ example: 9.8 })
  lower: number;
  @ApiProperty({ example: 15.7 })
  upper: number;
}

/** OpenAPI schema of POST /api/stats/counts's answer. */
export class CountsAnswerDto {
  @ApiProperty({ enum: ['poisson', 'quasipoisson'] })
  family: 'poisson' | 'quasipoisson';
  @ApiProperty({ example: 1.5, description: 'Pearson χ² / residual df of the Poisson fit.' })
  dispersion: number;
  @ApiProperty({ type: OverdispersionDto })
  overdispersion: OverdispersionDto;
  @ApiProperty()
  deviance: number;
  @ApiProperty()
  residualDf: number;
  @ApiProperty()
  logLik: number;
  @ApiProperty({ type: [ModelCoefficientDto], description: 'Log-rate coefficients (treatment contrasts against the control).' })
  coefficients: ModelCoefficientDto[];
  @ApiProperty({ type: [CountTermTestDto] })
  tests: CountTermTestDto[];
  @ApiProperty({ type: [ControlRatioDto], description: 'Count rate relative to the control’s.' })
  rateRatios: ControlRatioDto[];
  @ApiProperty({ type: [CountRateDto] })
  rates: CountRateDto[];
  @ApiProperty({ example: 'CTRL' })
  control: string;
  @ApiProperty()
  adjustment: string;
  @ApiProperty({ type: [String] })
  warnings: string[];
}
