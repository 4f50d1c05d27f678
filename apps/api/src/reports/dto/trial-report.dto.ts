import { FINDINGS_ANALYSES, SEPARATION_METHODS, type FindingsAnalysis, type ReportMean, type ReportMeasure, type ReportModel, type ReportTable, type SeparationMethod, type TrialReport } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { SavedAnalysisChoicesDto } from '../../analyses/dto/analysis-snapshot.dto';
import { ReportReviewDto } from '../../analyses/dto/review.dto';
import { FindingsRankTestDto, RoundRefDto } from '../../findings/dto/findings.dto';
import { MeasureDto } from '../../measures/dto/measure.dto';
import { SiteDto } from '../../sites/dto/site.dto';
import { AnovaSummaryDto, AnovaTableRowDto, LsMeanDto } from '../../stats/dto/anova-answer.dto';
import { TrialProtocolDto } from '../../trials/dto/trial-detail.dto';

export class ReportMeanDto extends LsMeanDto implements ReportMean {
  @ApiProperty({ type: String, nullable: true })
  letters: string | null;

  @ApiProperty({ type: Number, nullable: true })
  percentOfControl: number | null;
}

export class ReportTableDto implements ReportTable {
  @ApiProperty({ example: 'Time ratios to CTL' })
  title: string;

  @ApiProperty({ type: [String] })
  columns: string[];

  @ApiProperty({ type: 'array', items: { type: 'array', items: { oneOf: [{ type: 'string' }, { type: 'number' }], nullable: true } }, description: 'Rows, each cell in the order of columns.' })
  rows: Array<Array<string | number | null>>;
}

export class ReportModelDto implements ReportModel {
  @ApiProperty({ enum: FINDINGS_ANALYSES, enumName: 'FindingsAnalysis' })
  analysis: FindingsAnalysis;

  @ApiProperty({ example: 'Not-drained curves and time ratios' })
  label: string;

  @ApiProperty({ description: 'Which model and why, in plain words.' })
  why: string;

  @ApiProperty({ type: SavedAnalysisChoicesDto, description: 'The choices it ran with: GET /findings with them gives the same numbers.' })
  choices: SavedAnalysisChoicesDto;

  @ApiProperty({ type: [ReportTableDto] })
  tables: ReportTableDto[];

  @ApiProperty({ type: [String] })
  notices: string[];
}

export class ReportMeasureDto implements ReportMeasure {
  @ApiProperty({ type: MeasureDto })
  measure: MeasureDto;

  @ApiProperty({ type: RoundRefDto, nullable: true, description: 'Latest round with data for the measure; null when it has none yet.' })
  round: RoundRefDto | null;

  @ApiProperty({ description: 'All sites combined.' })
  scopeLabel: string;

  @ApiProperty({ enum: SEPARATION_METHODS, enumName: 'SeparationMethod' })
  method: SeparationMethod;

  @ApiProperty()
  alpha: number;

  @ApiProperty({ type: [AnovaTableRowDto], nullable: true })
  anova: AnovaTableRowDto[] | null;

  @ApiProperty({ type: AnovaSummaryDto, nullable: true })
  summary: AnovaSummaryDto | null;

  @ApiProperty({ type: [ReportMeanDto] })
  means: ReportMeanDto[];

  @ApiProperty({ type: FindingsRankTestDto, nullable: true })
  rankTest: FindingsRankTestDto | null;

  @ApiProperty({ type: [String], description: 'Engine warnings and notices of this measure.' })
  warnings: string[];

  @ApiProperty({ type: String, nullable: true, description: "Why there is no analysis (no data yet, or the engine's sentence)." })
  unavailable: string | null;

  @ApiProperty({ type: ReportModelDto, nullable: true, description: 'The model made for the measure (Findings’ default); null when that is the classical ANOVA above.' })
  model: ReportModelDto | null;
}

/** GET /api/trials/:trialId/report — everything the printable report page needs. */
export class TrialReportDto implements TrialReport {
  @ApiProperty({ format: 'date-time' })
  generatedAt: string;

  @ApiProperty()
  engineVersion: string;

  @ApiProperty({ type: TrialProtocolDto })
  protocol: TrialProtocolDto;

  @ApiProperty({ type: [SiteDto] })
  sites: SiteDto[];

  @ApiProperty({ type: [ReportMeasureDto] })
  measures: ReportMeasureDto[];

  @ApiProperty({ type: [String], description: 'Every caution of the report, each sentence naming its measure.' })
  cautions: string[];

  @ApiProperty({ description: 'A short plain paragraph on what the statistics do and do not show.' })
  explanation: string;

  @ApiProperty({ type: [ReportReviewDto], description: 'Saved analyses with sign-offs (statements and states) or open comments, oldest first.' })
  reviews: ReportReviewDto[];
}
