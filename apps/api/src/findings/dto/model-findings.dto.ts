import {
  AFT_DISTRIBUTIONS,
  COUNT_FAMILIES,
  FINDINGS_ANALYSES,
  REPEATED_COVARIANCES,
  SEPARATION_METHODS,
  type AftDistribution,
  type CountFamilyChoice,
  type FindingsAnalysis,
  type ModelFindingsContext,
  type RepeatedCovariance,
  type SeparationMethod,
} from '@friable/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { AnovaAnswerDto } from '../../stats/dto/anova-answer.dto';
import { CensoredAnswerDto } from '../../stats/dto/censored-answer.dto';
import { CountsAnswerDto } from '../../stats/dto/counts-answer.dto';
import { OrdinalAnswerDto } from '../../stats/dto/ordinal-answer.dto';
import { RepeatedAnswerDto } from '../../stats/dto/repeated-answer.dto';
import { ModelChoiceDto } from './model-choice.dto';
import { FindingsContextBaseDto, FindingsObservationRowDto, RoundRefDto } from './findings.dto';

export class ModelChoicesDto {
  @ApiProperty()
  measureId: number;

  @ApiProperty()
  roundId: number;

  @ApiProperty({ type: Number, nullable: true })
  siteId: number | null;

  @ApiProperty()
  alpha: number;

  @ApiProperty({ enum: SEPARATION_METHODS, enumName: 'SeparationMethod' })
  method: SeparationMethod;

  @ApiProperty({ enum: FINDINGS_ANALYSES, enumName: 'FindingsAnalysis' })
  analysis: FindingsAnalysis;

  @ApiPropertyOptional({ enum: AFT_DISTRIBUTIONS })
  distribution?: AftDistribution;

  @ApiPropertyOptional({ enum: REPEATED_COVARIANCES })
  covariance?: RepeatedCovariance;

  @ApiPropertyOptional({ enum: COUNT_FAMILIES })
  family?: CountFamilyChoice;

  @ApiPropertyOptional()
  covariateMeasureId?: number;

  @ApiPropertyOptional()
  covariateRoundId?: number;
}

export class ModelObservationRowDto extends FindingsObservationRowDto {
  @ApiPropertyOptional({ description: 'Rounds over time: the round of the value.' })
  roundLabel?: string;

  @ApiPropertyOptional({ description: 'Analysis of covariance: the plot’s covariate (stored decimal text).' })
  covariate?: string;
}

export class ModelFindingsContextDto extends FindingsContextBaseDto implements ModelFindingsContext {
  @ApiProperty({ type: ModelChoicesDto })
  choices: ModelChoicesDto;

  @ApiProperty({ type: ModelChoiceDto })
  modelChoice: ModelChoiceDto;

  @ApiProperty({ type: 'object', additionalProperties: true, description: 'The body sent to the stateless endpoint, without observations.' })
  engineRequest: Record<string, unknown>;

  @ApiProperty({ type: 'array', items: { type: 'object', additionalProperties: true }, description: 'The observations sent, in the engine’s order.' })
  engineObservations: Array<Record<string, unknown>>;

  @ApiPropertyOptional({ type: [RoundRefDto], description: 'Rounds over time: the rounds used, in time order.' })
  rounds?: RoundRefDto[];

  @ApiProperty({ type: [ModelObservationRowDto], description: 'The rows behind engineObservations, in the same order.' })
  observations: ModelObservationRowDto[];
}

export class CensoredFindingsDto extends CensoredAnswerDto {
  @ApiProperty({ enum: ['censored'] })
  analysis: 'censored';

  @ApiProperty({ type: ModelFindingsContextDto })
  context: ModelFindingsContextDto;
}

export class RepeatedFindingsDto extends RepeatedAnswerDto {
  @ApiProperty({ enum: ['repeated'] })
  analysis: 'repeated';

  @ApiProperty({ type: ModelFindingsContextDto })
  context: ModelFindingsContextDto;
}

export class AncovaFindingsDto extends AnovaAnswerDto {
  @ApiProperty({ enum: ['ancova'] })
  analysis: 'ancova';

  @ApiProperty({ type: ModelFindingsContextDto })
  context: ModelFindingsContextDto;
}

export class OrdinalFindingsDto extends OrdinalAnswerDto {
  @ApiProperty({ enum: ['ordinal'] })
  analysis: 'ordinal';

  @ApiProperty({ type: ModelFindingsContextDto })
  context: ModelFindingsContextDto;
}

export class CountsFindingsDto extends CountsAnswerDto {
  @ApiProperty({ enum: ['counts'] })
  analysis: 'counts';

  @ApiProperty({ type: ModelFindingsContextDto })
  context: ModelFindingsContextDto;
}
