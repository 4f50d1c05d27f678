import type { RemovalImpact, RemovalImpactSite } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';

export class RemovalImpactSiteDto implements RemovalImpactSite {
  @ApiProperty()
  siteId: number;

  @ApiProperty({ example: 'Hollow Lane' })
  siteName: string;

  @ApiProperty({ description: 'Values recorded (censored ones and missing ones with their reason included).' })
  values: number;

  @ApiProperty()
  censored: number;

  @ApiProperty({ description: 'Values recorded as missing, with their reason.' })
  missing: number;

  @ApiProperty({ description: 'Values that carry a note.' })
  notes: number;

  @ApiProperty({ description: 'Plot photos of the round (0 for a measure).' })
  photos: number;
}

/** GET …/measures/:id/removal-impact and …/rounds/:id/removal-impact — what removing it would archive, asked before. */
export class RemovalImpactDto implements RemovalImpact {
  @ApiProperty({ example: 'measure DT (Drain time)' })
  item: string;

  @ApiProperty({ type: [RemovalImpactSiteDto], description: 'The sites holding its data.' })
  sites: RemovalImpactSiteDto[];

  @ApiProperty()
  values: number;

  @ApiProperty()
  censored: number;

  @ApiProperty()
  missing: number;

  @ApiProperty()
  notes: number;

  @ApiProperty()
  photos: number;

  @ApiProperty({ example: 'Removes 240 recorded values and 12 notes of Drain time across 3 sites (30 censored). They are archived: kept on record, but no longer shown in the Ledger, Findings, exports or reports.' })
  summary: string;

  @ApiProperty({ description: 'True when data would be archived: the DELETE then needs the trial code typed, sent as confirm.' })
  confirmationNeeded: boolean;

  @ApiProperty({ type: String, nullable: true, description: 'Why the removal is refused whatever is typed (the only measure of a round), or null.' })
  refusal: string | null;
}
