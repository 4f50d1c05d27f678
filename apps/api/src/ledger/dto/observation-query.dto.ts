import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, Min } from 'class-validator';

/** GET /observations filters. */
export class ObservationQueryDto {
  @ApiPropertyOptional({ description: 'Only values of this site.' })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'siteId must be a whole number' })
  @Min(1, { message: 'siteId must be a whole number' })
  siteId?: number;

  @ApiPropertyOptional({ description: 'Only values of this assessment round.' })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'roundId must be a whole number' })
  @Min(1, { message: 'roundId must be a whole number' })
  roundId?: number;

  @ApiPropertyOptional({ description: 'Only values of this measure.' })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'measureId must be a whole number' })
  @Min(1, { message: 'measureId must be a whole number' })
  measureId?: number;
}
