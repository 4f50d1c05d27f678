import type { PlotPhoto } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';

export class PlotPhotoDto implements PlotPhoto {
  @ApiProperty()
  plotId: number;

  @ApiProperty()
  roundId: number;

  @ApiProperty({ enum: ['image/jpeg', 'image/png'] })
  contentType: 'image/jpeg' | 'image/png';

  @ApiProperty()
  sizeBytes: number;

  @ApiProperty({ type: Number, nullable: true })
  uploadedById: number | null;

  @ApiProperty({ format: 'date-time' })
  uploadedAt: string;
}
