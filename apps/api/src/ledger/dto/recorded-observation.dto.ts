import type { Observation, ObservationHistoryEntry } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';

/** A stored observation (named apart from the analysis request's ObservationDto). */
export class RecordedObservationDto implements Observation {
  @ApiProperty()
  id: number;

  @ApiProperty()
  plotId: number;

  @ApiProperty()
  plotLabel: string;

  @ApiProperty()
  siteId: number;

  @ApiProperty()
  siteName: string;

  @ApiProperty()
  block: number;

  @ApiProperty()
  treatmentCode: string;

  @ApiProperty()
  roundId: number;

  @ApiProperty()
  roundLabel: string;

  @ApiProperty()
  measureId: number;

  @ApiProperty()
  measureCode: string;

  @ApiProperty({ type: String, nullable: true, description: 'Exactly as typed and stored (decimal text); null when missing.' })
  valueText: string | null;

  @ApiProperty({ type: Number, nullable: true })
  valueNumber: number | null;

  @ApiProperty({ description: 'Right-censored at valueText (e.g. not drained by the cut-off).' })
  censored: boolean;

  @ApiProperty({ type: String, nullable: true })
  missingReason: string | null;

  @ApiProperty({ type: String, nullable: true })
  notes: string | null;

  @ApiProperty()
  version: number;

  @ApiProperty({ type: Number, nullable: true })
  recordedById: number | null;

  @ApiProperty({ type: String, nullable: true })
  recordedBy: string | null;

  @ApiProperty({ format: 'date-time' })
  recordedAt: string;
}

export class ObservationHistoryEntryDto implements ObservationHistoryEntry {
  @ApiProperty({ format: 'date-time' })
  at: string;

  @ApiProperty({ type: String, nullable: true })
  by: string | null;

  @ApiProperty({ enum: ['upload', 'edit'] })
  source: 'upload' | 'edit';

  @ApiProperty({ type: String, nullable: true })
  before: string | null;

  @ApiProperty({ type: String, nullable: true })
  after: string | null;
}
