import { AFT_DISTRIBUTIONS, MODEL_DESIGNS, type AftDistribution, type ModelDesign } from '@friable/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { ArrayMaxSize, IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import { MAX_OBSERVATIONS } from './anova-request.dto';
import { IsObservationList } from './observation-list.validator';

export class CensoredObservationDto {
  @ApiProperty({ example: 'GYP' })
  treatment: string;
  @ApiPropertyOptional({ example: '1', description: 'Block label, nested within its site (rcbd, multisite-rcbd).' })
  block?: string;
  @ApiPropertyOptional({ example: 'Hollow Lane' })
  site?: string;
  @ApiProperty({ oneOf: [{ type: 'number' }, { type: 'string' }], nullable: true, example: '212.5', description: 'The drain time, or the cut-off the plot had not drained by; null for a plot not timed, left out (the answer says how many were).' })
  value: number | string | null;
  @ApiProperty({ example: false, description: 'True when the plot had not drained by `value` (right-censored).' })
  censored: boolean;
}

/** POST /api/stats/censored — drain times with a cut-off. */
export class CensoredRequestDto {
  @ApiProperty({ enum: MODEL_DESIGNS, description: 'crd (treatment), rcbd (block, treatment), multisite-rcbd (site, block within site, treatment).' })
  @IsIn(MODEL_DESIGNS, { message: `design must be one of ${MODEL_DESIGNS.join(', ')}` })
  design: ModelDesign;

  @ApiProperty({ enum: AFT_DISTRIBUTIONS, description: 'Distribution of the time-ratio (accelerated-failure-time) model.' })
  @IsIn(AFT_DISTRIBUTIONS, { message: `distribution must be one of ${AFT_DISTRIBUTIONS.join(', ')}` })
  distribution: AftDistribution;

  @ApiPropertyOptional({ example: 'CTRL', description: 'The reference of the time ratios; default the first treatment.' })
  @IsOptional()
  @IsString({ message: 'control must be text' })
  @MaxLength(100, { message: 'control must be at most 100 characters' })
  control?: string;

  @ApiProperty({ type: [CensoredObservationDto] })
  @ArrayMaxSize(MAX_OBSERVATIONS, { message: `observations must hold at most ${MAX_OBSERVATIONS} rows` })
  @IsObservationList(undefined, { censored: 'required-boolean' }, 'left-out')
  observations: CensoredObservationDto[];
}
