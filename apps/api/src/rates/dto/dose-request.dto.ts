import { RATE_BASES, RATE_UNIT_IDS, type RateBasis, type RateUnitId } from '@friable/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsInt, IsNumber, IsOptional, Max, Min } from 'class-validator';

const finite = { allowNaN: false, allowInfinity: false };

export class DoseRequestDto {
  @ApiProperty({ example: 40 })
  @IsNumber(finite, { message: 'rate must be a number of at least 0' })
  @Min(0, { message: 'rate must be a number of at least 0' })
  rate: number;

  @ApiProperty({ enum: RATE_UNIT_IDS, example: 'lb/1000ft2' })
  @IsIn(RATE_UNIT_IDS, { message: `unit must be one of ${RATE_UNIT_IDS.join(', ')}` })
  unit: RateUnitId;

  @ApiProperty({ enum: RATE_BASES, example: 'area' })
  @IsIn(RATE_BASES, { message: `basis must be one of ${RATE_BASES.join(', ')}` })
  basis: RateBasis;

  @ApiPropertyOptional({ description: 'Give exactly one of areaM2, diameterCm, or lengthM with widthM.' })
  @IsOptional()
  @IsNumber(finite, { message: 'areaM2 must be a number above 0' })
  areaM2?: number;

  @ApiPropertyOptional({ example: 30 })
  @IsOptional()
  @IsNumber(finite, { message: 'diameterCm must be a number above 0' })
  diameterCm?: number;

  @ApiPropertyOptional()
  @IsOptional()
  @IsNumber(finite, { message: 'lengthM must be a number above 0' })
  lengthM?: number;

  @ApiPropertyOptional()
  @IsOptional()
  @IsNumber(finite, { message: 'widthM must be a number above 0' })
  widthM?: number;

  @ApiPropertyOptional({ description: 'Incorporation depth of the field rate (concentration basis).' })
  @IsOptional()
  @IsNumber(finite, { message: 'depthCm must be a number above 0' })
  depthCm?: number;

  @ApiPropertyOptional({ description: 'Soil volume of the container (concentration basis).' })
  @IsOptional()
  @IsNumber(finite, { message: 'soilVolumeL must be a number above 0' })
  soilVolumeL?: number;

  @ApiPropertyOptional()
  @IsOptional()
  @IsNumber(finite, { message: 'purity must be a fraction above 0 and at most 1' })
  purity?: number;

  @ApiPropertyOptional()
  @IsOptional()
  @IsNumber(finite, { message: 'moistureFraction must be a fraction of at least 0 and below 1' })
  moistureFraction?: number;

  @ApiPropertyOptional()
  @IsOptional()
  @IsNumber(finite, { message: 'bulkDensityKgPerL must be a number above 0' })
  bulkDensityKgPerL?: number;

  @ApiPropertyOptional({ enum: ['gypsum', 'other'] })
  @IsOptional()
  @IsIn(['gypsum', 'other'], { message: 'materialKind must be gypsum or other' })
  materialKind?: 'gypsum' | 'other';

  @ApiPropertyOptional({ description: 'With plots, the answer adds the total for all of them.' })
  @IsOptional()
  @IsInt({ message: 'plots must be a whole number from 1 to 100000' })
  @Min(1, { message: 'plots must be a whole number from 1 to 100000' })
  @Max(100000, { message: 'plots must be a whole number from 1 to 100000' })
  plots?: number;

  @ApiPropertyOptional({ default: 0 })
  @IsOptional()
  @IsNumber(finite, { message: 'marginPercent must be a number from 0 to 100' })
  @Min(0, { message: 'marginPercent must be a number from 0 to 100' })
  @Max(100, { message: 'marginPercent must be a number from 0 to 100' })
  marginPercent?: number;
}
