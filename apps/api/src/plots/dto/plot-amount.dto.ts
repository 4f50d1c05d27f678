import type { PlotAmount } from '@friable/contracts';
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
