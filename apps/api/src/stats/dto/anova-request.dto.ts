import { ANALYSIS_DESIGNS } from '@friable/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { ArrayMaxSize, ArrayMinSize, ArrayUnique, IsArray, IsBoolean, IsIn, IsNumber, IsOptional, IsString, Length, Max, MaxLength, Min } from 'class-validator';
import { IsObservationList } from './observation-list.validator';

export { ANALYSIS_DESIGNS };
export const TRANSFORMS = ['none', 'log', 'sqrt', 'arcsine-sqrt'] as const;
export const SEPARATION_METHODS = ['lsd', 'tukey', 'dunnett', 'bonferroni', 'holm'] as const;
export const MAX_OBSERVATIONS = 200_000;

export class ObservationDto {
  @ApiPropertyOptional({ example: 'CTRL' })
  treatment?: string;
  @ApiPropertyOptional({ type: 'object', additionalProperties: { type: 'string' }, example: { A: 'a1', B: 'b2' }, description: 'factorial-rcbd: the level of each factor, in place of treatment' })
  factors?: Record<string, string>;
  @ApiPropertyOptional({ example: '1', description: 'Block label, nested within its site.' })
  block?: string;
  @ApiPropertyOptional({ example: 'North' })
  site?: string;
  @ApiProperty({ oneOf: [{ type: 'number' }, { type: 'string' }], nullable: true, example: '12.3', description: 'A JSON number, or decimal text (analysed exactly); null for a plot not measured, left out (the answer says how many were).' })
  value: number | string | null;
  @ApiPropertyOptional({ oneOf: [{ type: 'number' }, { type: 'string' }], example: '10.8', description: 'A baseline covariate (e.g. the plot’s day-0 value): the answer becomes an analysis of covariance (covariate row, adjusted means, slopes).' })
  covariate?: number | string;
}

export class AnovaRequestDto {
  @ApiProperty({ enum: ANALYSIS_DESIGNS })
  @IsIn(ANALYSIS_DESIGNS, { message: `design must be one of ${ANALYSIS_DESIGNS.join(', ')}` })
  design: (typeof ANALYSIS_DESIGNS)[number];

  @ApiPropertyOptional({
    type: [String],
    minItems: 2,
    maxItems: 4,
    example: ['Amendment', 'Mulch'],
    description: 'Factorials and split plots: the factor names (a split plot’s from the whole-plot factor down); default: the keys of the first observation’s factors.',
  })
  @IsOptional()
  @IsArray({ message: 'factorNames must be a list' })
  @ArrayMinSize(2, { message: 'factorNames must name 2 to 4 factors' })
  @ArrayMaxSize(4, { message: 'factorNames must name 2 to 4 factors' })
  @ArrayUnique({ message: 'factorNames must not repeat a name' })
  @IsString({ each: true, message: 'each factorNames entry must be text' })
  @Length(1, 100, { each: true, message: 'each factorNames entry must be 1 to 100 characters' })
  factorNames?: string[];

  @ApiPropertyOptional({
    enum: ['anova', 'reml'],
    description: 'Factorials and split plots: the classical ANOVA or REML (Kenward–Roger). Default: anova when every plot is present, else reml; the answer says which and why.',
  })
  @IsOptional()
  @IsIn(['anova', 'reml'], { message: 'model must be anova or reml' })
  model?: 'anova' | 'reml';

  @ApiPropertyOptional({
    enum: ['kenward-roger', 'satterthwaite'],
    default: 'kenward-roger',
    description: 'REML fits: the denominator degrees of freedom of the F tests and comparisons (as pbkrtest or lmerTest give them).',
  })
  @IsOptional()
  @IsIn(['kenward-roger', 'satterthwaite'], { message: 'ddf must be kenward-roger or satterthwaite' })
  ddf?: 'kenward-roger' | 'satterthwaite';

  @ApiPropertyOptional({ default: 0.05, minimum: 0.0001, maximum: 0.5 })
  @IsOptional()
  @IsNumber({}, { message: 'alpha must be a number' })
  @Min(0.0001, { message: 'alpha must be at least 0.0001' })
  @Max(0.5, { message: 'alpha must be at most 0.5' })
  alpha?: number;

  @ApiPropertyOptional({ enum: ['random', 'fixed'], default: 'random' })
  @IsOptional()
  @IsIn(['random', 'fixed'], { message: 'sitesAre must be random or fixed' })
  sitesAre?: 'random' | 'fixed';

  @ApiPropertyOptional({ example: 'CTRL', description: 'The control treatment, needed for Dunnett.' })
  @IsOptional()
  @IsString()
  @MaxLength(100)
  control?: string;

  @ApiPropertyOptional({ enum: TRANSFORMS, default: 'none' })
  @IsOptional()
  @IsIn(TRANSFORMS, { message: `transform must be one of ${TRANSFORMS.join(', ')}` })
  transform?: (typeof TRANSFORMS)[number];

  @ApiPropertyOptional({ enum: SEPARATION_METHODS, isArray: true, default: ['tukey'] })
  @IsOptional()
  @IsArray({ message: 'meanSeparation must be a list' })
  @ArrayUnique({ message: 'meanSeparation must not repeat a method' })
  @IsIn(SEPARATION_METHODS, { each: true, message: `each meanSeparation must be one of ${SEPARATION_METHODS.join(', ')}` })
  meanSeparation?: Array<(typeof SEPARATION_METHODS)[number]>;

  @ApiPropertyOptional({ default: false, description: 'Show Fisher’s LSD even when the treatment F test is not significant.' })
  @IsOptional()
  @IsBoolean()
  forceLsd?: boolean;

  @ApiProperty({ type: [ObservationDto] })
  @ArrayMaxSize(MAX_OBSERVATIONS, { message: `observations must hold at most ${MAX_OBSERVATIONS} rows` })
  @IsObservationList(undefined, { covariate: 'decimal' }, 'left-out')
  observations: ObservationDto[];
}
