import type { FindingsSummary, FindingsSummaryRow } from '@friable/contracts';
import { ApiProperty, PickType } from '@nestjs/swagger';
import { FindingsMeasureDto, FindingsScopeDto, RoundRefDto } from './findings.dto';
import { FindingsQueryDto } from './findings-query.dto';

/** GET /api/trials/:trialId/findings/summary — the measure, round and scope of GET /findings (query text). */
export class FindingsSummaryQueryDto extends PickType(FindingsQueryDto, ['measureId', 'roundId', 'siteId'] as const) {}

export class FindingsSummaryRowDto implements FindingsSummaryRow {
  @ApiProperty()
  treatment: string;

  @ApiProperty({ description: 'Plots of the treatment in the scope.' })
  plots: number;

  @ApiProperty({ description: 'Values recorded, censored ones included at their cut-off.' })
  values: number;

  @ApiProperty({ description: 'Values not reached by the cut-off.' })
  censored: number;

  @ApiProperty({ description: 'Plots without a value (marked missing, or never recorded).' })
  missing: number;

  @ApiProperty({ type: Number, nullable: true })
  mean: number | null;

  @ApiProperty({ type: Number, nullable: true, description: 'Sample standard deviation; null with fewer than two values.' })
  sd: number | null;

  @ApiProperty({ type: Number, nullable: true })
  median: number | null;

  @ApiProperty({ type: Number, nullable: true })
  min: number | null;

  @ApiProperty({ type: Number, nullable: true })
  max: number | null;
}

export class FindingsSummaryDto implements FindingsSummary {
  @ApiProperty({ type: FindingsMeasureDto })
  measure: FindingsMeasureDto;

  @ApiProperty({ type: RoundRefDto })
  round: RoundRefDto;

  @ApiProperty({ type: FindingsScopeDto })
  scope: FindingsScopeDto;

  @ApiProperty({ type: [FindingsSummaryRowDto], description: 'In the protocol’s treatment order.' })
  treatments: FindingsSummaryRowDto[];
}
