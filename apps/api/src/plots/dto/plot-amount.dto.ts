import { APPLIED_UNITS, type AppliedUnit, type LevelAmount, type PlotAmount } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { DoseAnswerDto } from '../../rates/dto/dose-answer.dto';

export class SiteTotalDto {
  @ApiProperty({ type: Number, nullable: true })
  grams: number | null;

  @ApiProperty({ type: Number, nullable: true })
  litres: number | null;
}

export class PlotAmountDto implements PlotAmount {
  @ApiProperty()
  siteId: number;

  @ApiProperty()
  treatmentId: number;

  @ApiProperty()
  treatmentCode: string;

  @ApiProperty()
  plots: number;

  @ApiProperty({ type: DoseAnswerDto, nullable: true })
  perPlot: DoseAnswerDto | null;

  @ApiProperty({ type: SiteTotalDto, nullable: true, description: "All the site's plots of this treatment, with the margin." })
  siteTotal: SiteTotalDto | null;
}

/** GET …/level-amounts: one factor level's material per unit it is applied to at one site. */
export class LevelAmountDto implements LevelAmount {
  @ApiProperty()
  siteId: number;

  @ApiProperty()
  factorId: number;

  @ApiProperty()
  factorName: string;

  @ApiProperty()
  levelId: number;

  @ApiProperty()
  levelCode: string;

  @ApiProperty()
  levelName: string;

  @ApiProperty({ enum: APPLIED_UNITS, enumName: 'AppliedUnit' })
  appliedTo: AppliedUnit;

  @ApiProperty({ description: 'Measured plots one unit covers; 1 for a plot.' })
  plotsPerUnit: number;

  @ApiProperty({ description: "Surface of one unit: the site's plot area × plotsPerUnit." })
  unitAreaM2: number;

  @ApiProperty({ description: 'Units of this level at the site.' })
  units: number;

  @ApiProperty({ type: DoseAnswerDto, nullable: true })
  perUnit: DoseAnswerDto | null;

  @ApiProperty({ type: SiteTotalDto, nullable: true, description: "All the site's units of this level, with the margin." })
  siteTotal: SiteTotalDto | null;

  @ApiProperty({ type: String, nullable: true, description: "Why no amount could be worked out (a rate the site's geometry cannot take)." })
  problem: string | null;
}
