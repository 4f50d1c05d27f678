import { MODEL_DESIGNS, REPEATED_COVARIANCES, type ModelDesign, type RepeatedCovariance } from '@friable/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { ArrayMaxSize, IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import { MAX_OBSERVATIONS } from './anova-request.dto';
import { IsObservationList } from './observation-list.validator';

export class RepeatedObservationDto {
  @ApiProperty({ example: 'GYP' })
  treatment: string;
  @ApiPropertyOptional({ example: '1', description: 'Block label, nested within its site; in a crd it names the replicate. A plot is site + block + treatment.' })
  block?: string;
  @ApiPropertyOptional({ example: 'Hollow Lane' })
  site?: string;
  @ApiProperty({ example: 'Day 14' })
  round: string;
  @ApiProperty({ oneOf: [{ type: 'number' }, { type: 'string' }], example: 14, description: 'The round’s day offset.' })
  time: number | string;
  @ApiProperty({ oneOf: [{ type: 'number' }, { type: 'string' }], nullable: true, example: '212.5', description: 'null for a plot not measured at that round, left out (the answer says how many were).' })
  value: number | string | null;
}

/** POST /api/stats/repeated — one measure over several rounds on the same plots. */
export class RepeatedRequestDto {
  @ApiProperty({ enum: MODEL_DESIGNS })
  @IsIn(MODEL_DESIGNS, { message: `design must be one of ${MODEL_DESIGNS.join(', ')}` })
  design: ModelDesign;

  @ApiProperty({ enum: REPEATED_COVARIANCES, description: 'Within-plot covariance: compound symmetry, continuous-time AR(1) on the day offsets, unstructured, or auto (lowest AIC).' })
  @IsIn(REPEATED_COVARIANCES, { message: `covariance must be one of ${REPEATED_COVARIANCES.join(', ')}` })
  covariance: RepeatedCovariance;

  @ApiPropertyOptional({ example: 'CTRL', description: 'Listed first; default the first treatment.' })
  @IsOptional()
  @IsString({ message: 'control must be text' })
  @MaxLength(100, { message: 'control must be at most 100 characters' })
  control?: string;

  @ApiProperty({ type: [RepeatedObservationDto] })
  @ArrayMaxSize(MAX_OBSERVATIONS, { message: `observations must hold at most ${MAX_OBSERVATIONS} rows` })
  @IsObservationList(undefined, { round: 'required-label', time: 'required-decimal' }, 'left-out')
  observations: RepeatedObservationDto[];
}
