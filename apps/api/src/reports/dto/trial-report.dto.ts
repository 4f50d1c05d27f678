import { SEPARATION_METHODS, type ReportMean, type ReportMeasure, type SeparationMethod, type TrialReport } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { ReportReviewDto } from '../../analyses/dto/review.dto';
import { FindingsRankTestDto, RoundRefDto } from '../../findings/dto/findings.dto';
import { MeasureDto } from '../../measures/dto/measure.dto';
import { SiteDto } from '../../sites/dto/site.dto';
import { AnovaSummaryDto, AnovaTableRowDto, LsMeanDto } from '../../stats/dto/anova-answer.dto';
import { TrialProtocolDto } from '../../trials/dto/trial-detail.dto';

export class ReportMeanDto extends LsMeanDto implements ReportMean {
  @ApiProperty({ type: String, nullable: true })
  letters: string | null;

  @ApiProperty({ type: Boolean, nullable: true, description: 'Dunnett only: whether the mean differs from the control’s (null for the control and other methods).' })
  differsFromControl: boolean | null;

  @ApiProperty({ type: Number, nullable: true })
  percentOfControl: number | null;
}

export class ReportMeasureDto implements ReportMeasure {
  @ApiProperty({ type: MeasureDto })
  measure: MeasureDto;

  @ApiProperty({ type: RoundRefDto, nullable: true, description: 'The round chosen, else the latest round with data for the measure; null when there is none.' })
  round: RoundRefDto | null;

  @ApiProperty({ description: 'The site reported, or "all sites combined".' })
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
