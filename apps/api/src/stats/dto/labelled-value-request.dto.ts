import { COUNT_FAMILIES, MODEL_DESIGNS, type CountFamilyChoice, type ModelDesign } from '@friable/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { ArrayMaxSize, IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import { MAX_OBSERVATIONS } from './anova-request.dto';
import { IsObservationList } from './observation-list.validator';

export class LabelledValueDto {
  @ApiProperty({ example: 'CMP' })
  treatment: string;
  @ApiPropertyOptional({ example: '1', description: 'Block label, nested within its site (rcbd, multisite-rcbd).' })
  block?: string;
  @ApiPropertyOptional({ example: 'Hollow Lane' })
  site?: string;
  @ApiProperty({ oneOf: [{ type: 'number' }, { type: 'string' }], example: 3 })
  value: number | string;
}

/** POST /api/stats/ordinal — scores on an ordered scale (for example crumble 1–5). */
export class OrdinalRequestDto {
  @ApiProperty({ enum: MODEL_DESIGNS })
  @IsIn(MODEL_DESIGNS, { message: `design must be one of ${MODEL_DESIGNS.join(', ')}` })
  design: ModelDesign;

  @ApiPropertyOptional({ example: 'CTRL', description: 'The reference of the odds ratios; default the first treatment.' })
  @IsOptional()
  @IsString({ message: 'control must be text' })
  @MaxLength(100, { message: 'control must be at most 100 characters' })
  control?: string;

  @ApiProperty({ type: [LabelledValueDto], description: 'value: the score.' })
  @ArrayMaxSize(MAX_OBSERVATIONS, { message: `observations must hold at most ${MAX_OBSERVATIONS} rows` })
  @IsObservationList()
  observations: LabelledValueDto[];
}

/** POST /api/stats/counts — whole counts per plot. */
export class CountsRequestDto extends OrdinalRequestDto {
  @ApiPropertyOptional({ enum: COUNT_FAMILIES, default: 'auto', description: 'auto: quasi-Poisson when Pearson’s χ² shows overdispersion at the 5 % level.' })
  @IsOptional()
  @IsIn(COUNT_FAMILIES, { message: `family must be one of ${COUNT_FAMILIES.join(', ')}` })
  family?: CountFamilyChoice;
}
