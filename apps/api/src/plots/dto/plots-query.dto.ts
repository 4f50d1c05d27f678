import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsNumber, IsOptional, Max, Min } from 'class-validator';

export class PlotsQueryDto {
  @ApiPropertyOptional({ description: 'Only the plots of this site.' })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'siteId must be a whole number' })
  siteId?: number;
}

export class AmountsQueryDto {
  @ApiPropertyOptional({ default: 10, description: 'Extra to prepare for spills and weighing losses, in percent.' })
  @IsOptional()
  @Type(() => Number)
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'marginPercent must be a number from 0 to 100' })
  @Min(0, { message: 'marginPercent must be a number from 0 to 100' })
  @Max(100, { message: 'marginPercent must be a number from 0 to 100' })
  marginPercent?: number;
}
