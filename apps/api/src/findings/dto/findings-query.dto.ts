import {
  AFT_DISTRIBUTIONS,
  ANALYSIS_TRANSFORMS,
  COUNT_FAMILIES,
  FINDINGS_ANALYSES,
  REPEATED_COVARIANCES,
  SEPARATION_METHODS,
  type AftDistribution,
  type AnalysisTransform,
  type CountFamilyChoice,
  type FindingsAnalysis,
  type RepeatedCovariance,
  type SeparationMethod,
} from '@friable/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsBoolean, IsIn, IsInt, IsNumber, IsOptional, Max, Min } from 'class-validator';

const booleanText = ({ value }: { value: unknown }) => (value === 'true' || value === true ? true : value === 'false' || value === false ? false : value);

/** GET /api/trials/:trialId/findings — the choices of one analysis (query text). */
export class FindingsQueryDto {
  @ApiProperty({ description: 'The measure to analyse.' })
  @Type(() => Number)
  @IsInt({ message: 'measure must be a whole number' })
  @Min(1, { message: 'measure must be a whole number' })
  measureId: number;

  @ApiPropertyOptional({ description: 'The assessment round to analyse; leave out for the latest round holding values of the measure in this scope.' })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'round must be a whole number' })
  @Min(1, { message: 'round must be a whole number' })
  roundId?: number;

  @ApiPropertyOptional({ description: 'One site; leave out for all sites combined (a trial with one site: that site).' })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'site must be a whole number' })
  @Min(1, { message: 'site must be a whole number' })
  siteId?: number;

  @ApiPropertyOptional({ enum: ['random', 'fixed'], default: 'random', description: 'With all sites combined: random tests treatment against site × treatment.' })
  @IsOptional()
  @IsIn(['random', 'fixed'], { message: 'sites must be random or fixed' })
  sitesAre?: 'random' | 'fixed';

  @ApiPropertyOptional({ enum: ANALYSIS_TRANSFORMS, default: 'none' })
  @IsOptional()
  @IsIn(ANALYSIS_TRANSFORMS, { message: `transform must be one of ${ANALYSIS_TRANSFORMS.join(', ')}` })
  transform?: AnalysisTransform;

  @ApiPropertyOptional({ enum: SEPARATION_METHODS, default: 'tukey', description: 'Mean separation method.' })
  @IsOptional()
  @IsIn(SEPARATION_METHODS, { message: `mean separation must be one of ${SEPARATION_METHODS.join(', ')}` })
  method?: SeparationMethod;

  @ApiPropertyOptional({ default: 0.05, minimum: 0.0001, maximum: 0.5 })
  @IsOptional()
  @Type(() => Number)
  @IsNumber({}, { message: 'significance level must be a number' })
  @Min(0.0001, { message: 'significance level must be at least 0.0001' })
  @Max(0.5, { message: 'significance level must be at most 0.5' })
  alpha?: number;

  @ApiPropertyOptional({ default: false, description: 'Compute Fisher’s LSD even when the treatment F test is not significant.' })
  @IsOptional()
  @Transform(booleanText)
  @IsBoolean({ message: 'LSD whatever the F test must be true or false' })
  forceLsd?: boolean;

  @ApiPropertyOptional({
    enum: FINDINGS_ANALYSES,
    description:
      'Leave out for the model made for the measure: censored (time with a cut-off), ordinal (score), counts (count); a number: ancova with a day-0 baseline and one later round, repeated with two or more rounds, else anova.',
  })
  @IsOptional()
  @IsIn(FINDINGS_ANALYSES, { message: `analysis must be one of ${FINDINGS_ANALYSES.join(', ')}` })
  analysis?: FindingsAnalysis;

  @ApiPropertyOptional({ enum: AFT_DISTRIBUTIONS, default: 'weibull', description: 'censored: the time-ratio model’s distribution.' })
  @IsOptional()
  @IsIn(AFT_DISTRIBUTIONS, { message: `distribution must be one of ${AFT_DISTRIBUTIONS.join(', ')}` })
  distribution?: AftDistribution;

  @ApiPropertyOptional({ enum: REPEATED_COVARIANCES, default: 'auto', description: 'repeated: the within-plot covariance (auto: lowest AIC).' })
  @IsOptional()
  @IsIn(REPEATED_COVARIANCES, { message: `covariance must be one of ${REPEATED_COVARIANCES.join(', ')}` })
  covariance?: RepeatedCovariance;

  @ApiPropertyOptional({ enum: COUNT_FAMILIES, default: 'auto', description: 'counts: auto takes quasi-Poisson when the counts are overdispersed.' })
  @IsOptional()
  @IsIn(COUNT_FAMILIES, { message: `family must be one of ${COUNT_FAMILIES.join(', ')}` })
  family?: CountFamilyChoice;

  @ApiPropertyOptional({ description: 'ancova: the measure whose values are the covariate; default the analysed measure.' })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'baseline measure must be a whole number' })
  @Min(1, { message: 'baseline measure must be a whole number' })
  covariateMeasureId?: number;

  @ApiPropertyOptional({ description: 'ancova: the round whose values are the covariate; default the day-0 round (else the earliest earlier round with values).' })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'baseline round must be a whole number' })
  @Min(1, { message: 'baseline round must be a whole number' })
  covariateRoundId?: number;
}
