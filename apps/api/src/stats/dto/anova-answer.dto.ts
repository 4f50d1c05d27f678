import type {
  AnovaAnswer,
  AnovaSummary,
  AnovaTableRow,
  DifferenceError,
  ErrorStratumSummary,
  FactorialMean,
  LsMean,
  MeanPair,
  MethodComparisonSet,
  RankTestAnswer,
  ResidualPoint,
  SliceTest,
  StratumComparisonSet,
  TermMeans,
} from '@friable/contracts';
import { ApiExtraModels, ApiProperty, ApiPropertyOptional, getSchemaPath } from '@nestjs/swagger';

export class AnovaTableRowDto implements AnovaTableRow {
  @ApiProperty({ description: "'block', 'treatment', 'site', 'block:site', 'site:treatment', factor names and 'A:B', 'error', 'total'." })
  term: string;

  @ApiProperty()
  df: number;

  @ApiProperty({ type: Number, nullable: true, description: 'Null for a REML row.' })
  ss: number | null;

  @ApiProperty({ type: Number, nullable: true, description: 'Null where the term is not tested.' })
  ms: number | null;

  @ApiProperty({ type: Number, nullable: true })
  f: number | null;

  @ApiProperty({ type: Number, nullable: true })
  p: number | null;

  @ApiPropertyOptional({ type: String, nullable: true, description: "The row the term was tested against ('error', 'block:A', 'site:treatment', 'kenward-roger'); null when not tested." })
  errorTerm?: string | null;

  @ApiPropertyOptional({ description: 'REML rows: numerator degrees of freedom.' })
  numDf?: number;

  @ApiPropertyOptional({ description: 'REML rows: Kenward–Roger denominator degrees of freedom.' })
  denDf?: number;
}

export class AnovaSummaryDto implements AnovaSummary {
  @ApiProperty()
  n: number;

  @ApiProperty()
  grandMean: number;

  @ApiProperty({ description: 'Coefficient of variation, % (100 × root MSE / grand mean).' })
  cv: number;

  @ApiProperty()
  rootMse: number;

  @ApiProperty()
  errorDf: number;
}

export class LsMeanDto implements LsMean {
  @ApiProperty()
  treatment: string;

  @ApiProperty()
  n: number;

  @ApiProperty()
  mean: number;

  @ApiProperty()
  se: number;

  @ApiPropertyOptional({ description: 'With a transform: the mean back on the original scale.' })
  backTransformedMean?: number;
}

export class MeanPairDto implements MeanPair {
  @ApiProperty()
  a: string;

  @ApiProperty()
  b: string;

  @ApiProperty({ description: 'mean a − mean b' })
  diff: number;

  @ApiProperty()
  se: number;

  @ApiProperty()
  lower: number;

  @ApiProperty()
  upper: number;

  @ApiProperty({ description: 'Unadjusted for LSD, adjusted otherwise.' })
  p: number;

  @ApiProperty()
  significant: boolean;
}

export class MethodComparisonSetDto implements MethodComparisonSet {
  @ApiProperty({ type: Number, nullable: true, description: "On the scale of diff/se: t (LSD), q/√2 (Tukey), Dunnett's d, Bonferroni t; null for Holm." })
  critical: number | null;

  @ApiProperty({ type: Number, nullable: true, description: 'critical × se when every pair has the same se, else null.' })
  leastSignificantDifference: number | null;

  @ApiProperty({ type: [MeanPairDto] })
  pairs: MeanPairDto[];
}

export class ComparisonsByMethodDto {
  @ApiPropertyOptional({ type: MethodComparisonSetDto })
  lsd?: MethodComparisonSetDto;

  @ApiPropertyOptional({ type: MethodComparisonSetDto })
  tukey?: MethodComparisonSetDto;

  @ApiPropertyOptional({ type: MethodComparisonSetDto })
  dunnett?: MethodComparisonSetDto;

  @ApiPropertyOptional({ type: MethodComparisonSetDto })
  bonferroni?: MethodComparisonSetDto;

  @ApiPropertyOptional({ type: MethodComparisonSetDto })
  holm?: MethodComparisonSetDto;
}

const lettersByTreatment = { type: 'object', additionalProperties: { type: 'string' }, description: 'Treatment → compact letters ("a", "ab", …).' } as const;

export class LettersByMethodDto {
  @ApiPropertyOptional(lettersByTreatment)
  lsd?: Record<string, string>;

  @ApiPropertyOptional(lettersByTreatment)
  tukey?: Record<string, string>;

  @ApiPropertyOptional(lettersByTreatment)
  bonferroni?: Record<string, string>;

  @ApiPropertyOptional(lettersByTreatment)
  holm?: Record<string, string>;
}

export class ShapiroWilkDto {
  @ApiProperty()
  w: number;

  @ApiProperty()
  p: number;
}

export class BrownForsytheDto {
  @ApiProperty()
  f: number;

  @ApiProperty()
  p: number;
}

export class BartlettDto {
  @ApiProperty()
  statistic: number;

  @ApiProperty()
  p: number;
}

export class ResidualPointDto implements ResidualPoint {
  @ApiProperty({ description: 'Index of the observation in the list given to the engine.' })
  index: number;

  @ApiProperty()
  fitted: number;

  @ApiProperty()
  residual: number;

  @ApiProperty({ type: Number, nullable: true, description: 'Null for a plot with leverage 1.' })
  standardized: number | null;

  @ApiProperty({ description: '|standardized| > 3.' })
  flagged: boolean;
}

export class DiagnosticsDto {
  @ApiProperty({ type: ShapiroWilkDto, nullable: true, description: 'Null outside 3..5000 residuals.' })
  shapiroWilk: ShapiroWilkDto | null;

  @ApiProperty({ type: BrownForsytheDto, nullable: true, description: 'Null when a treatment has a single plot.' })
  brownForsythe: BrownForsytheDto | null;

  @ApiPropertyOptional({ type: BartlettDto, description: "Multisite only: Bartlett's test of the per-site error variances." })
  bartlett?: BartlettDto;

  @ApiProperty({ type: [ResidualPointDto] })
  residuals: ResidualPointDto[];
}

export class AnalysisModelDto {
  @ApiProperty({ enum: ['anova', 'reml'] })
  kind: 'anova' | 'reml';

  @ApiProperty({ description: 'Why this model was used, in a sentence.' })
  reason: string;
}

export class AnalysisStratumDto implements ErrorStratumSummary {
  @ApiProperty({ description: "'plot', 'whole plot', 'sub plot' or 'sub-sub plot'." })
  stratum: string;

  @ApiProperty({ description: "The ANOVA row that is this stratum's error, e.g. 'block:Amendment' or 'error'." })
  errorTerm: string;

  @ApiProperty()
  ms: number;

  @ApiProperty()
  df: number;

  @ApiProperty({ type: [String], description: 'The terms tested against this error.' })
  terms: string[];
}

export class FactorialMeanDto extends LsMeanDto implements FactorialMean {
  @ApiProperty({ type: 'object', additionalProperties: { type: 'string' }, description: 'Level of each factor of the term, by factor name.' })
  levels: Record<string, string>;
}

export class TermMeansDto implements TermMeans {
  @ApiProperty({ example: 'Amendment:Mulch' })
  term: string;

  @ApiProperty({ type: [String] })
  factors: string[];

  @ApiProperty({ type: [FactorialMeanDto] })
  means: FactorialMeanDto[];
}

export class StratumComparisonSetDto implements StratumComparisonSet {
  @ApiProperty({ description: "The error the differences are judged against: 'block:A', 'error', 'block:A and error (Satterthwaite)', 'Kenward–Roger'." })
  errorTerm: string;

  @ApiProperty()
  df: number;

  @ApiProperty({ type: ComparisonsByMethodDto })
  comparisons: ComparisonsByMethodDto;

  @ApiProperty({ type: LettersByMethodDto })
  letters: LettersByMethodDto;
}

export class DifferenceErrorDto implements DifferenceError {
  @ApiProperty({ example: 'Amendment within Mulch' })
  kind: string;

  @ApiProperty({ example: 'Two Amendment (whole-plot) means at the same or different levels of Mulch' })
  description: string;

  @ApiProperty({ description: 'Standard error of the difference.' })
  se: number;

  @ApiProperty({ description: "Degrees of freedom (Satterthwaite's where strata mix; Kenward–Roger for REML)." })
  df: number;

  @ApiProperty({ description: 't at α (two-sided); the weighted t where strata mix.' })
  critical: number;

  @ApiProperty({ description: 'critical × se.' })
  lsd: number;

  @ApiProperty()
  errorTerm: string;
}

export class SliceTestDto extends StratumComparisonSetDto implements SliceTest {
  @ApiProperty({ description: 'The factor tested.' })
  factor: string;

  @ApiProperty({ description: 'The factor whose level is held.' })
  within: string;

  @ApiProperty()
  level: string;

  @ApiProperty()
  numDf: number;

  @ApiProperty()
  denDf: number;

  @ApiProperty()
  f: number;

  @ApiProperty()
  p: number;

  @ApiProperty({ type: [FactorialMeanDto] })
  means: FactorialMeanDto[];
}

export class VarianceComponentDto {
  @ApiProperty({ example: 'block:Amendment' })
  name: string;

  @ApiProperty()
  variance: number;
}

export class CovariateSlopeDto {
  @ApiProperty()
  mean: number;
  @ApiProperty()
  slope: number;
  @ApiProperty()
  se: number;
  @ApiProperty()
  t: number;
  @ApiProperty()
  p: number;
}

export class FTestDto {
  @ApiProperty()
  f: number;
  @ApiProperty()
  p: number;
  @ApiProperty()
  df1: number;
  @ApiProperty()
  df2: number;
}

/** The answer of POST /api/stats/anova, exactly as the engine gives it. */
@ApiExtraModels(LsMeanDto, StratumComparisonSetDto)
export class AnovaAnswerDto implements AnovaAnswer {
  @ApiProperty({ type: [AnovaTableRowDto] })
  anova: AnovaTableRowDto[];

  @ApiProperty({ type: AnovaSummaryDto })
  summary: AnovaSummaryDto;

  @ApiProperty({ type: [LsMeanDto] })
  means: LsMeanDto[];

  @ApiPropertyOptional({
    type: 'object',
    additionalProperties: { type: 'array', items: { $ref: getSchemaPath(LsMeanDto) } },
    description: "Factorial only: LS means of each factor's levels, by factor name.",
  })
  factorMeans?: Record<string, LsMeanDto[]>;

  @ApiProperty({ type: ComparisonsByMethodDto })
  comparisons: ComparisonsByMethodDto;

  @ApiProperty({ type: LettersByMethodDto, description: 'Per method, treatment → compact letters.' })
  letters: LettersByMethodDto;

  @ApiProperty({ type: DiagnosticsDto })
  diagnostics: DiagnosticsDto;

  @ApiProperty({ type: [String], description: 'Plain sentences from the engine.' })
  warnings: string[];

  @ApiPropertyOptional({ type: AnalysisModelDto, description: 'Factorials and split plots: the model used and why.' })
  model?: AnalysisModelDto;

  @ApiPropertyOptional({ type: [AnalysisStratumDto], description: 'Classical factorials and split plots: the error strata, whole plot first.' })
  strata?: AnalysisStratumDto[];

  @ApiPropertyOptional({ type: [TermMeansDto], description: 'Factorials and split plots: least-squares means of every main effect and interaction.' })
  marginalMeans?: TermMeansDto[];

  @ApiPropertyOptional({
    type: 'object',
    additionalProperties: { $ref: getSchemaPath(StratumComparisonSetDto) },
    description: "Factorials and split plots: each factor's level means compared in its own stratum, by factor name.",
  })
  factorComparisons?: Record<string, StratumComparisonSetDto>;

  @ApiPropertyOptional({ type: [DifferenceErrorDto], description: 'Factorials and split plots: standard errors of a difference by kind.' })
  differences?: DifferenceErrorDto[];

  @ApiPropertyOptional({ type: [SliceTestDto], description: 'Factorials and split plots: each factor within each level of another, for significant two-factor interactions.' })
  slices?: SliceTestDto[];

  @ApiPropertyOptional({ type: [VarianceComponentDto], description: 'REML: the variance of each random term and of the error.' })
  varianceComponents?: VarianceComponentDto[];

  @ApiPropertyOptional({ type: CovariateSlopeDto, description: 'With a covariate (analysis of covariance): the common slope, with the covariate’s mean.' })
  covariate?: CovariateSlopeDto;

  @ApiPropertyOptional({ type: FTestDto, description: 'With a covariate: the test of equal slopes across treatments.' })
  slopes?: FTestDto;

  @ApiPropertyOptional({ type: FTestDto, description: 'With a covariate: the covariate itself between treatments (a baseline should not differ).' })
  baseline?: FTestDto;
}

/** POST /api/stats/friedman and /api/stats/kruskal answers. */
export class RankTestAnswerDto implements RankTestAnswer {
  @ApiProperty()
  statistic: number;

  @ApiProperty()
  df: number;

  @ApiProperty()
  p: number;

  @ApiPropertyOptional({ description: 'Friedman only.' })
  blocksUsed?: number;

  @ApiPropertyOptional({ type: [String], description: 'Friedman only: incomplete blocks left out.' })
  droppedBlocks?: string[];
}
