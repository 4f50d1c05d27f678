import { APPLIED_UNITS, type AppliedUnit, type ErrorStratum, type Site } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';

/** One error line of the design's ANOVA at a site (a split plot has a whole-plot and a sub-plot error). */
export class ErrorStratumDto implements ErrorStratum {
  @ApiProperty({ enum: APPLIED_UNITS, enumName: 'AppliedUnit' })
  unit: AppliedUnit;

  @ApiProperty({ example: 'Whole-plot error' })
  name: string;

  @ApiProperty()
  errorDf: number;

  @ApiProperty({ example: '(2 blocks − 1) × (2 levels of Amendment − 1)', description: 'How the df are counted, in words.' })
  arithmetic: string;

  @ApiProperty({ type: [String], description: "Terms tested against it: factor names joined by ':', or 'treatment'." })
  terms: string[];

  @ApiProperty({ type: Number, nullable: true, description: 'The F the first term must exceed at p = 0.05; null with no error df.' })
  criticalF: number | null;
}

export class SiteDto implements Site {
  @ApiProperty()
  id: number;

  @ApiProperty({ description: 'Bumped by every save; send it back with each edit: another one answers 409 with the current record.' })
  version: number;

  @ApiProperty()
  name: string;

  @ApiProperty({ type: String, nullable: true })
  location: string | null;

  @ApiProperty({ type: String, nullable: true })
  soilDescription: string | null;

  @ApiProperty({ enum: ['rectangle', 'round'] })
  shape: 'rectangle' | 'round';

  @ApiProperty({ type: Number, nullable: true })
  lengthM: number | null;

  @ApiProperty({ type: Number, nullable: true })
  widthM: number | null;

  @ApiProperty({ type: Number, nullable: true, description: 'Inside diameter at the soil surface, for round plots or containers.' })
  diameterCm: number | null;

  @ApiProperty({ type: Number, nullable: true })
  containerDepthCm: number | null;

  @ApiProperty({ type: Number, nullable: true })
  soilVolumeL: number | null;

  @ApiProperty({ description: 'Computed from the geometry.' })
  areaM2: number;

  @ApiProperty()
  blocks: number;

  @ApiProperty({ description: 'Two or three capital letters starting every plot label at this site, unique in the trial.' })
  labelPrefix: string;

  @ApiProperty({ type: Number, nullable: true })
  leadUserId: number | null;

  @ApiProperty({ type: String, nullable: true })
  leadName: string | null;

  @ApiProperty({ type: String, format: 'date-time', nullable: true })
  randomizedAt: string | null;

  @ApiProperty({ type: String, nullable: true, description: 'The seed text used for the current layout.' })
  randomizationSeed: string | null;

  @ApiProperty({ description: 'Plots at the site, 0 until randomized.' })
  plotCount: number;

  @ApiProperty()
  hasObservations: boolean;

  @ApiProperty({ type: [String], description: 'Guardrail sentences: fewer than 4 blocks, error df below 12 in any stratum, one treatment.' })
  warnings: string[];

  @ApiProperty({ type: [ErrorStratumDto], description: 'The error strata of the design at this site.' })
  strata: ErrorStratumDto[];
}
