import { ApiProperty } from '@nestjs/swagger';

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
