import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, IsString, Matches, Min } from 'class-validator';

export class ActivityQueryDto {
  @ApiPropertyOptional({ example: 'site.randomized', description: 'Only entries of this kind.' })
  @IsOptional()
  @IsString()
  @Matches(/^[a-z-]+\.[a-z-]+$/, { message: 'kind must look like site.randomized' })
  kind?: string;

  @ApiPropertyOptional({ description: 'Only entries about this site.' })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'siteId must be a whole number' })
  @Min(1, { message: 'siteId must be a whole number' })
  siteId?: number;

  @ApiPropertyOptional({ description: 'Only changes made by this person.' })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'userId must be a whole number' })
  @Min(1, { message: 'userId must be a whole number' })
  userId?: number;
}
