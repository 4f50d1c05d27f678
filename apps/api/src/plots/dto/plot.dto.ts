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
}
