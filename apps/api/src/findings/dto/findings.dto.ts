import {
  ANALYSIS_DESIGNS,
  ANALYSIS_TRANSFORMS,
  MEASURE_KINDS,
  SEPARATION_METHODS,
  type AnalysisDesign,
  type AnalysisTransform,
  type Findings,
  type FindingsChoices,
  type FindingsContext,
  type FindingsObservationRow,
  type FindingsRankTest,
  type MeansOverTimePoint,
  type MeasureKind,
  type NotDrainedCurve,
  type NotDrainedStep,
  type PercentOfControl,
  type SeparationMethod,
} from '@friable/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { AnovaAnswerDto, LsMeanDto } from '../../stats/dto/anova-answer.dto';
import { ModelChoiceDto } from './model-choice.dto';

export class FindingsChoicesDto implements FindingsChoices {
  @ApiProperty()
  measureId: number;

  @ApiProperty()
  roundId: number;

  @ApiProperty({ type: Number, nullable: true, description: 'null = all sites combined.' })
  siteId: number | null;

  @ApiProperty({ enum: ['random', 'fixed'] })
  sitesAre: 'random' | 'fixed';

  @ApiProperty({ enum: ANALYSIS_TRANSFORMS, enumName: 'AnalysisTransform' })
  transform: AnalysisTransform;

  @ApiProperty({ enum: SEPARATION_METHODS, enumName: 'SeparationMethod' })
  method: SeparationMethod;

  @ApiProperty()
  alpha: number;

  @ApiProperty()
  forceLsd: boolean;
}

/** The options given to the engine beside the observations (POST /api/stats/anova body without observations). */
export class EngineRequestDto {
  @ApiProperty({ enum: ANALYSIS_DESIGNS, enumName: 'AnalysisDesign' })
  design: AnalysisDesign;

  @ApiProperty()
  alpha: number;

  @ApiPropertyOptional({ enum: ['random', 'fixed'] })
  sitesAre?: 'random' | 'fixed';

  @ApiPropertyOptional()
  control?: string;

  @ApiProperty({ enum: ANALYSIS_TRANSFORMS, enumName: 'AnalysisTransform' })
  transform: AnalysisTransform;

  @ApiProperty({ enum: SEPARATION_METHODS, enumName: 'SeparationMethod', isArray: true })
  meanSeparation: SeparationMethod[];

  @ApiProperty()
  forceLsd: boolean;
}

export class FindingsMeasureDto {
  @ApiProperty()
  id: number;

  @ApiProperty()
  code: string;

  @ApiProperty()
  name: string;

  @ApiProperty()
  unit: string;

  @ApiProperty({ enum: MEASURE_KINDS, enumName: 'MeasureKind' })
  kind: MeasureKind;

  @ApiProperty()
  higherIsBetter: boolean;

  @ApiProperty({ type: Number, nullable: true })
  cutoff: number | null;

  @ApiProperty()
  decimals: number;
}

export class RoundRefDto {
  @ApiProperty()
  id: number;

  @ApiProperty()
  label: string;

  @ApiProperty()
  dayOffset: number;
}

export class FindingsScopeDto {
  @ApiProperty({ type: Number, nullable: true })
  siteId: number | null;

  @ApiProperty({ type: String, nullable: true })
  siteName: string | null;

  @ApiProperty({ description: "'one site' or 'all sites combined'." })
  label: string;

  @ApiProperty({ type: [String] })
  siteNames: string[];
}

export class FindingsObservationRowDto implements FindingsObservationRow {
  @ApiProperty()
  observationId: number;

  @ApiProperty()
  plotLabel: string;

  @ApiProperty()
  siteName: string;

  @ApiProperty()
  block: number;

  @ApiProperty({ description: 'Treatment code (the label the engine sees).' })
  treatment: string;

  @ApiProperty({ description: 'The stored decimal text (censored values: the cut-off value).' })
  value: string;

  @ApiProperty()
  censored: boolean;

  @ApiPropertyOptional({ type: 'object', additionalProperties: { type: 'string' }, description: 'Factorial and split designs: the level code of each factor, by factor name.' })
  factors?: Record<string, string>;
}

export class CensoredSummaryDto {
  @ApiProperty()
  count: number;

  @ApiProperty({ type: Number, nullable: true })
  cutoff: number | null;
}

export class MissingReasonCountDto {
  @ApiProperty()
  reason: string;

  @ApiProperty()
  count: number;
}

export class MissingSummaryDto {
  @ApiProperty()
  count: number;

  @ApiProperty({ type: [MissingReasonCountDto] })
  reasons: MissingReasonCountDto[];
}

export class PercentOfControlDto implements PercentOfControl {
  @ApiProperty()
  treatment: string;

  @ApiProperty({ type: Number, nullable: true, description: 'mean / control mean × 100; null without a control or when the control mean is 0.' })
  percent: number | null;
}

export class FindingsRankTestDto implements FindingsRankTest {
  @ApiProperty({ enum: ['friedman', 'kruskal-wallis'] })
  test: 'friedman' | 'kruskal-wallis';

  @ApiProperty({ type: Number, nullable: true, description: 'Null when the rank test could not run (unavailable says why).' })
  statistic: number | null;

  @ApiProperty({ type: Number, nullable: true })
  df: number | null;

  @ApiProperty({ type: Number, nullable: true })
  p: number | null;

  @ApiPropertyOptional()
  blocksUsed?: number;

  @ApiPropertyOptional({ type: [String] })
  droppedBlocks?: string[];

  @ApiPropertyOptional()
  unavailable?: string;
}

export class NotDrainedStepDto implements NotDrainedStep {
  @ApiProperty({ description: "Time in the measure's unit." })
  time: number;

  @ApiProperty({ description: "Share in [0, 1] of the treatment's plots not yet drained at this time." })
  share: number;

  @ApiProperty()
  atRisk: number;

  @ApiProperty()
  events: number;
}

export class NotDrainedCurveDto implements NotDrainedCurve {
  @ApiProperty()
  treatment: string;

  @ApiProperty()
  plots: number;

  @ApiProperty({ description: 'Plots not drained by the cut-off.' })
  censored: number;

  @ApiProperty({ type: [NotDrainedStepDto] })
  steps: NotDrainedStepDto[];
}

export class MeansOverTimePointDto implements MeansOverTimePoint {
  @ApiProperty()
  roundId: number;

  @ApiProperty()
  roundLabel: string;

  @ApiProperty()
  dayOffset: number;

  @ApiProperty({ type: [LsMeanDto] })
  means: LsMeanDto[];

  @ApiPropertyOptional({ description: "Why a round with data could not be analysed (the engine's sentence)." })
  unavailable?: string;
}

/** What every Findings context holds, the ANOVA's and each model's. */
export class FindingsContextBaseDto {
  @ApiProperty()
  trialId: number;

  @ApiProperty()
  trialCode: string;

  @ApiProperty({ type: FindingsMeasureDto })
  measure: FindingsMeasureDto;

  @ApiProperty({ type: RoundRefDto, description: 'The round analysed (rounds over time: the latest used).' })
  round: RoundRefDto;

  @ApiProperty({ type: FindingsScopeDto })
  scope: FindingsScopeDto;

  @ApiProperty({ type: CensoredSummaryDto })
  censored: CensoredSummaryDto;

  @ApiProperty({ type: MissingSummaryDto })
  missing: MissingSummaryDto;

  @ApiProperty({ type: String, nullable: true })
  controlCode: string | null;

  @ApiProperty({ type: [String] })
  notices: string[];

  @ApiProperty({ description: 'SHA-256 (hex) of the canonical JSON of the observations sent to the engine.' })
  dataHash: string;

  @ApiProperty()
  engineVersion: string;
}

export class FindingsContextDto extends FindingsContextBaseDto implements FindingsContext {
  @ApiProperty({ type: FindingsChoicesDto })
  choices: FindingsChoicesDto;

  @ApiProperty({ type: EngineRequestDto })
  engineRequest: EngineRequestDto;

  @ApiProperty({ type: [FindingsObservationRowDto], description: 'In the order given to the engine (residual index = position).' })
  observations: FindingsObservationRowDto[];

  @ApiProperty({ type: [PercentOfControlDto] })
  percentOfControl: PercentOfControlDto[];

  @ApiProperty({ type: FindingsRankTestDto })
  rankTest: FindingsRankTestDto;

  @ApiPropertyOptional({ type: [NotDrainedCurveDto], description: 'Time-with-cutoff measures only.' })
  notDrained?: NotDrainedCurveDto[];

  @ApiProperty({ type: [MeansOverTimePointDto] })
  meansOverTime: MeansOverTimePointDto[];

  @ApiPropertyOptional({ type: ModelChoiceDto, description: 'Which model this is (the ANOVA), the one made for the measure and the others on offer.' })
  modelChoice?: ModelChoiceDto;
}

/** GET /api/trials/:trialId/findings: the same body as POST /api/stats/anova, plus context. */
export class FindingsDto extends AnovaAnswerDto implements Findings {
  @ApiProperty({ type: FindingsContextDto })
  context: FindingsContextDto;
}
