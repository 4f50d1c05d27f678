import type { Plot } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';

export class PlotDto implements Plot {
  @ApiProperty()
  id: number;

  @ApiProperty({ example: 'HL-101' })
  label: string;

  @ApiProperty()
  siteId: number;

  @ApiProperty()
  siteName: string;

  @ApiProperty()
  block: number;

  @ApiProperty()
  position: number;

  @ApiProperty()
  treatmentId: number;

  @ApiProperty()
  treatmentCode: string;

  @ApiProperty({ type: Number, nullable: true, description: 'Split designs: the whole plot within its block, from 1.' })
  wholePlot: number | null;

  @ApiProperty({ type: Number, nullable: true, description: 'Split designs: the sub plot within its whole plot, from 1.' })
  subPlot: number | null;

  @ApiProperty({ type: Number, nullable: true, description: 'Split-split plot: the sub-sub plot within its sub plot, from 1.' })
  subSubPlot: number | null;

  @ApiProperty({ type: String, nullable: true, example: 'HL-B2-W3', description: 'Split designs: the label of the whole plot the plot lies in.' })
  wholePlotLabel: string | null;
}
