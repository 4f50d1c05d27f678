import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

class CovarianceChoiceDto {
  @ApiProperty({ enum: ['cs', 'ar1', 'unstructured'] })
  structure: 'cs' | 'ar1' | 'unstructured';
  @ApiProperty({ type: 'object', additionalProperties: { type: 'number' }, example: { variance: 4.1, phi: 0.97 }, description: 'cs: plotVariance, residualVariance, correlation; ar1: variance, phi (correlation a day apart); unstructured: variance[round], covariance[round,round].' })
  parameters: Record<string, number>;
  @ApiProperty({ description: 'REML log-likelihood (nlme’s and lme4’s convention, R’s default treatment contrasts).' })
  logLik: number;
  @ApiProperty({ description: '−2 logLik + 2 (fixed effects + covariance parameters).' })
  aic: number;
  @ApiPropertyOptional({ description: 'Why this structure could not be fitted (then the other fields are absent).' })
  unavailable?: string;
}

class TermTestDto {
  @ApiProperty({ example: 'treatment:round' })
  term: string;
  @ApiProperty({ example: 8 })
  numDf: number;
  @ApiProperty({ example: 104.3, description: 'Kenward–Roger denominator df.' })
  denDf: number;
  @ApiProperty({ example: 2.4 })
  f: number;
  @ApiProperty({ example: 0.02 })
  p: number;
}

class RoundTestDto extends TermTestDto {
  @ApiProperty({ example: 'Day 14' })
  round: string;
}

class SphericityDto {
  @ApiProperty({ nullable: true, type: Number, description: 'Null with two rounds.' })
  mauchlyW: number | null;
  @ApiProperty({ nullable: true, type: Number })
  chiSquare: number | null;
  @ApiProperty({ nullable: true, type: Number })
  df: number | null;
  @ApiProperty({ nullable: true, type: Number })
  p: number | null;
  @ApiProperty({ example: 0.87 })
  greenhouseGeisser: number;
  @ApiProperty({ example: 0.98, description: 'Lecoutre’s form, as car; above 1 it is used as 1.' })
  huynhFeldt: number;
}

class SplitPlotRowDto {
  @ApiProperty({ example: 'treatment:round' })
  term: string;
  @ApiProperty({ enum: ['between plots', 'within plots'] })
  stratum: 'between plots' | 'within plots';
  @ApiProperty()
  df: number;
  @ApiProperty()
  ss: number;
  @ApiProperty()
  ms: number;
  @ApiProperty({ nullable: true, type: Number })
  f: number | null;
  @ApiProperty({ nullable: true, type: Number })
  p: number | null;
  @ApiPropertyOptional({ nullable: true, type: Number })
  pGreenhouseGeisser?: number | null;
  @ApiPropertyOptional({ nullable: true, type: Number })
  pHuynhFeldt?: number | null;
}

class SplitPlotDto {
  @ApiProperty({ type: [SplitPlotRowDto] })
  table: SplitPlotRowDto[];
  @ApiProperty()
  plotsUsed: number;
  @ApiProperty()
  plotsLeftOut: number;
}

class RepeatedMeanDto {
  @ApiProperty({ example: 'GYP' })
  treatment: string;
  @ApiProperty({ example: 'Day 14' })
  round: string;
  @ApiProperty()
  mean: number;
  @ApiProperty({ description: 'Kenward–Roger standard error.' })
  se: number;
  @ApiProperty()
  df: number;
}

class RoundDto {
  @ApiProperty({ example: 'Day 14' })
  round: string;
  @ApiProperty({ example: 14 })
  time: number;
}

/** OpenAPI schema of POST /api/stats/repeated's answer. */
export class RepeatedAnswerDto {
  @ApiProperty({ type: CovarianceChoiceDto })
  covariance: CovarianceChoiceDto;
  @ApiProperty({ type: [CovarianceChoiceDto] })
  candidates: CovarianceChoiceDto[];
  @ApiProperty({ type: [TermTestDto] })
  anova: TermTestDto[];
  @ApiProperty({ type: [RoundTestDto] })
  byRound: RoundTestDto[];
  @ApiProperty({ type: SphericityDto, nullable: true })
  sphericity: SphericityDto | null;
  @ApiProperty({ type: SplitPlotDto, nullable: true })
  splitPlot: SplitPlotDto | null;
  @ApiProperty({ type: [RepeatedMeanDto] })
  means: RepeatedMeanDto[];
  @ApiProperty({ type: [RoundDto] })
  rounds: RoundDto[];
  @ApiProperty()
  plots: number;
  @ApiProperty({ type: [String] })
  warnings: string[];
}
