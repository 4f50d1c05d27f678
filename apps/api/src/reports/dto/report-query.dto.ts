import { SEPARATION_METHODS, type SeparationMethod } from '@friable/contracts';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsIn, IsInt, IsNumber, IsOptional, Max, Min } from 'class-validator';

/** GET /api/trials/:trialId/report — the Findings page's choices the printed report follows (query text). */
export class ReportQueryDto {
  @ApiPropertyOptional({ description: 'The assessment round to report; leave out for each measure’s latest round with values.' })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'round must be a whole number' })
  @Min(1, { message: 'round must be a whole number' })
  roundId?: number;

  @ApiPropertyOptional({ description: 'One site; leave out for all sites combined (a trial with one site reports that site).' })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'site must be a whole number' })
  @Min(1, { message: 'site must be a whole number' })
  siteId?: number;

  @ApiPropertyOptional({ enum: ['random', 'fixed'], default: 'random', description: 'With all sites combined: random tests treatment against site × treatment.' })
  @IsOptional()
  @IsIn(['random', 'fixed'], { message: 'sites must be random or fixed' })
  sitesAre?: 'random' | 'fixed';

  @ApiPropertyOptional({ enum: SEPARATION_METHODS, default: 'tukey', description: 'Mean separation method.' })
  @IsOptional()
  @IsIn(SEPARATION_METHODS, { message: `mean separation must be one of ${SEPARATION_METHODS.join(', ')}` })
  method?: SeparationMethod;

  @ApiPropertyOptional({ default: 0.05, minimum: 0.0001, maximum: 0.5 })
  @IsOptional()
  @Type(() => Number)
  @IsNumber({}, { message: 'significance level must be a number' })
  @Min(0.0001, { message: 'significance level must be at least 0.0001' })
  @Max(0.5, { message: 'significance level must be at most 0.5' })
  alpha?: number;
}
