import type { Site } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';

export class SiteDto implements Site {
  @ApiProperty()
  id: number;

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

  @ApiProperty({ type: [String], description: 'Guardrail sentences: fewer than 4 blocks, error df below 12, one treatment.' })
  warnings: string[];
}
