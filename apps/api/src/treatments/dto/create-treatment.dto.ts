import { RATE_BASES, RATE_UNIT_IDS, type RateBasis, type RateUnitId } from '@friable/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsIn, IsInt, IsNumber, IsOptional, IsString, Matches, Max, MaxLength, Min, MinLength } from 'class-validator';

export class CreateTreatmentDto {
  @ApiProperty({ example: 'G40', description: 'Unique in the trial: 1 to 12 letters, digits or dashes.' })
  @IsString({ message: 'code must be 1 to 12 letters, digits or dashes' })
  @Matches(/^[A-Za-z0-9][A-Za-z0-9-]{0,11}$/, { message: 'code must be 1 to 12 letters, digits or dashes' })
  code: string;

  @ApiProperty({ example: 'Gypsum 40 lb/1000 ft²' })
  @IsString({ message: 'name must be text' })
  @MinLength(1, { message: 'name must be 1 to 120 characters long' })
  @MaxLength(120, { message: 'name must be 1 to 120 characters long' })
  name: string;

  @ApiPropertyOptional({ type: String, nullable: true })
  @IsOptional()
  @IsString({ message: 'description must be text' })
  @MaxLength(2000, { message: 'description must be at most 2000 characters long' })
  description?: string | null;

  @ApiPropertyOptional({ default: false })
  @IsOptional()
  @IsBoolean({ message: 'isControl must be true or false' })
  isControl?: boolean;

  @ApiPropertyOptional({ type: Number, nullable: true, example: 40 })
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'rateValue must be a number of at least 0' })
  @Min(0, { message: 'rateValue must be a number of at least 0' })
  @Max(1e9, { message: 'rateValue must be at most 1,000,000,000' })
  rateValue?: number | null;

  @ApiPropertyOptional({ enum: RATE_UNIT_IDS, nullable: true })
  @IsOptional()
  @IsIn(RATE_UNIT_IDS, { message: `rateUnit must be one of ${RATE_UNIT_IDS.join(', ')}` })
  rateUnit?: RateUnitId | null;

  @ApiPropertyOptional({ enum: RATE_BASES, default: 'area' })
  @IsOptional()
  @IsIn(RATE_BASES, { message: `rateBasis must be one of ${RATE_BASES.join(', ')}` })
  rateBasis?: RateBasis;

  @ApiPropertyOptional({ type: Number, nullable: true, description: 'Depth the field rate is mixed into (concentration basis).' })
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'incorporationDepthCm must be a number above 0' })
  @Min(0.01, { message: 'incorporationDepthCm must be a number above 0' })
  @Max(1000, { message: 'incorporationDepthCm must be at most 1000' })
  incorporationDepthCm?: number | null;

  @ApiPropertyOptional({ type: String, nullable: true, example: 'Garden gypsum, 20 kg bag' })
  @IsOptional()
  @IsString({ message: 'product must be text' })
  @MaxLength(200, { message: 'product must be at most 200 characters long' })
  product?: string | null;

  @ApiPropertyOptional({ type: Number, nullable: true, description: 'Share of active material, above 0 and at most 1.' })
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'purity must be a fraction above 0 and at most 1' })
  @Min(0.000001, { message: 'purity must be a fraction above 0 and at most 1' })
  @Max(1, { message: 'purity must be a fraction above 0 and at most 1' })
  purity?: number | null;

  @ApiPropertyOptional({ enum: ['as-is', 'dry'], default: 'as-is' })
  @IsOptional()
  @IsIn(['as-is', 'dry'], { message: 'moistureBasis must be as-is or dry' })
  moistureBasis?: 'as-is' | 'dry';

  @ApiPropertyOptional({ type: Number, nullable: true, description: 'Water share of the as-is product, at least 0 and below 1.' })
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'moistureFraction must be a fraction of at least 0 and below 1' })
  @Min(0, { message: 'moistureFraction must be a fraction of at least 0 and below 1' })
  @Max(0.999999, { message: 'moistureFraction must be a fraction of at least 0 and below 1' })
  moistureFraction?: number | null;

  @ApiPropertyOptional({ enum: ['gypsum', 'other'], default: 'other' })
  @IsOptional()
  @IsIn(['gypsum', 'other'], { message: 'materialKind must be gypsum or other' })
  materialKind?: 'gypsum' | 'other';

  @ApiPropertyOptional({ description: 'Order in lists, from 1.' })
  @IsOptional()
  @IsInt({ message: 'position must be a whole number from 0 to 999' })
  @Min(0, { message: 'position must be a whole number from 0 to 999' })
  @Max(999, { message: 'position must be a whole number from 0 to 999' })
  position?: number;
}
