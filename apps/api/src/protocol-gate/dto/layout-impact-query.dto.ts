import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, Min } from 'class-validator';

/** Which layouts a change would clear: one site's, or every site's of the trial (design, treatments, factors). */
export class LayoutImpactQueryDto {
  @ApiPropertyOptional({ description: 'One site (changing its blocks, removing it, randomizing it again); leave out for every site.' })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'site must be a whole number' })
  @Min(1, { message: 'site must be a whole number' })
  siteId?: number;
}
