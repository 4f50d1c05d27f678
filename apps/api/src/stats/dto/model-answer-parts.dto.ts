import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

/** OpenAPI schema: one likelihood-ratio test of a term (the term dropped from the full model). */
export class LikelihoodRatioTestDto {
  @ApiProperty({ example: 'treatment', description: "'site' (dropped with its blocks), 'block', 'block:site', 'treatment'." })
  term: string;
  @ApiProperty({ example: 4 })
  df: number;
  @ApiProperty({ example: 18.2 })
  chiSquare: number;
  @ApiProperty({ example: 0.0011, nullable: true, type: Number })
  p: number | null;
}

/** OpenAPI schema: a coefficient on the model's scale, labelled term[level] (treatment contrasts against the control). */
export class ModelCoefficientDto {
  @ApiProperty({ example: 'treatment[GYP]' })
  term: string;
  @ApiProperty({ example: -0.21 })
  estimate: number;
  @ApiProperty({ example: 0.08 })
  se: number;
}

/** OpenAPI schema: a treatment's ratio to the control (time, odds or rate), simultaneous 95 % limits, adjusted p. */
export class ControlRatioDto {
  @ApiProperty({ example: 'CMP' })
  treatment: string;
  @ApiProperty({ example: 1.8 })
  ratio: number;
  @ApiProperty({ example: 1.2 })
  lower: number;
  @ApiProperty({ example: 2.7 })
  upper: number;
  @ApiProperty({ example: 0.002, description: 'Single-step adjusted p-value.' })
  p: number;
}

/** OpenAPI schema: the rank test beside a model. */
export class ModelRankTestDto {
  @ApiProperty({ enum: ['friedman', 'kruskal-wallis'] })
  test: 'friedman' | 'kruskal-wallis';
  @ApiProperty({ nullable: true, type: Number })
  statistic: number | null;
  @ApiProperty({ nullable: true, type: Number })
  df: number | null;
  @ApiProperty({ nullable: true, type: Number })
  p: number | null;
  @ApiPropertyOptional({ description: 'Why the rank test could not run.' })
  unavailable?: string;
}
