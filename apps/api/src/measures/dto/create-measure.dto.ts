import { MEASURE_KINDS, type MeasureKind } from '@friable/contracts';
import { MEASURE_UNITS } from '@friable/field';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsBoolean, IsIn, IsInt, IsNumber, IsOptional, IsString, Matches, Max, MaxLength, Min, MinLength } from 'class-validator';

export const MEASURE_UNIT_IDS = MEASURE_UNITS.map((unit) => unit.id);
const finite = { allowNaN: false, allowInfinity: false };
/** The measures table keeps limits as DECIMAL(18,6): at most 12 digits before the point. */
const LIMIT = 999_999_999_999;
/**
 * A measure's name heads a column of the sheets and the CSV template: it starts with a letter or digit and holds no
 * comma, semicolon, quote, tab or line break (they would split or break the column); brackets and units such as
 * "(s)", "g/m²" or "%" are fine, as the templates use them.
 */
export const MEASURE_NAME_PATTERN = /^[\p{L}\p{N}][^,;"\t\r\n]*$/u;
export const MEASURE_NAME_RULE = 'name must start with a letter or digit and hold no commas, semicolons, quotes or line breaks (it heads a column of the sheets); brackets and units such as (s) or g/m² are fine';
const withinLimit = (field: string) => `${field} must be a number from -999,999,999,999 to 999,999,999,999`;

export class CreateMeasureDto {
  @ApiProperty({ example: 'DRAIN', description: 'Unique in the trial: 1 to 12 letters, digits or dashes.' })
  @IsString({ message: 'code must be 1 to 12 letters, digits or dashes' })
  @Matches(/^[A-Za-z0-9][A-Za-z0-9-]{0,11}$/, { message: 'code must be 1 to 12 letters, digits or dashes' })
  code: string;

  @ApiProperty({ example: 'drain time (first pour)', description: 'Unique in the trial (ignoring case): 1 to 80 characters starting with a letter or digit; brackets and units are fine.' })
  @Transform(({ value }) => (typeof value === 'string' ? value.trim() : value))
  @IsString({ message: 'name must be text' })
  @MinLength(1, { message: 'name must be 1 to 80 characters long' })
  @MaxLength(80, { message: 'name must be 1 to 80 characters long' })
  @Matches(MEASURE_NAME_PATTERN, { message: MEASURE_NAME_RULE })
  name: string;

  @ApiProperty({ enum: MEASURE_UNIT_IDS, example: 's', description: "A unit Friable converts (@friable/field's MEASURE_UNITS)." })
  @IsIn(MEASURE_UNIT_IDS, { message: `unit must be one of ${MEASURE_UNIT_IDS.join(', ')}` })
  unit: string;

  @ApiProperty({ enum: MEASURE_KINDS })
  @IsIn(MEASURE_KINDS, { message: `kind must be one of ${MEASURE_KINDS.join(', ')}` })
  kind: MeasureKind;

  @ApiPropertyOptional({ type: Number, nullable: true, description: 'Lowest score (kind score).' })
  @IsOptional()
  @IsNumber(finite, { message: 'scaleMin must be a number' })
  @Min(-LIMIT, { message: withinLimit('scaleMin') })
  @Max(LIMIT, { message: withinLimit('scaleMin') })
  scaleMin?: number | null;

  @ApiPropertyOptional({ type: Number, nullable: true, description: 'Highest score (kind score).' })
  @IsOptional()
  @IsNumber(finite, { message: 'scaleMax must be a number' })
  @Min(-LIMIT, { message: withinLimit('scaleMax') })
  @Max(LIMIT, { message: withinLimit('scaleMax') })
  scaleMax?: number | null;

  @ApiPropertyOptional({ type: Number, nullable: true, description: 'Cut-off in the unit (kind time-with-cutoff).' })
  @IsOptional()
  @IsNumber(finite, { message: 'cutoff must be a number above 0' })
  @Min(0.000001, { message: 'cutoff must be a number above 0' })
  @Max(LIMIT, { message: 'cutoff must be at most 999,999,999,999' })
  cutoff?: number | null;

  @ApiPropertyOptional({ type: Number, nullable: true, description: 'Below: a warning.' })
  @IsOptional()
  @IsNumber(finite, { message: 'plausibleMin must be a number' })
  @Min(-LIMIT, { message: withinLimit('plausibleMin') })
  @Max(LIMIT, { message: withinLimit('plausibleMin') })
  plausibleMin?: number | null;

  @ApiPropertyOptional({ type: Number, nullable: true, description: 'Above: a warning.' })
  @IsOptional()
  @IsNumber(finite, { message: 'plausibleMax must be a number' })
  @Min(-LIMIT, { message: withinLimit('plausibleMax') })
  @Max(LIMIT, { message: withinLimit('plausibleMax') })
  plausibleMax?: number | null;

  @ApiPropertyOptional({ type: Number, nullable: true, description: 'Below: an error.' })
  @IsOptional()
  @IsNumber(finite, { message: 'hardMin must be a number' })
  @Min(-LIMIT, { message: withinLimit('hardMin') })
  @Max(LIMIT, { message: withinLimit('hardMin') })
  hardMin?: number | null;

  @ApiPropertyOptional({ type: Number, nullable: true, description: 'Above: an error.' })
  @IsOptional()
  @IsNumber(finite, { message: 'hardMax must be a number' })
  @Min(-LIMIT, { message: withinLimit('hardMax') })
  @Max(LIMIT, { message: withinLimit('hardMax') })
  hardMax?: number | null;

  @ApiPropertyOptional({ default: 1, minimum: 0, maximum: 6 })
  @IsOptional()
  @IsInt({ message: 'decimals must be a whole number from 0 to 6' })
  @Min(0, { message: 'decimals must be a whole number from 0 to 6' })
  @Max(6, { message: 'decimals must be a whole number from 0 to 6' })
  decimals?: number;

  @ApiProperty({ description: 'Asked, never assumed: whether a higher value is the better outcome (false for drain times).' })
  @IsBoolean({ message: 'higherIsBetter must be answered: say whether higher or lower values are better' })
  higherIsBetter: boolean;

  @ApiPropertyOptional()
  @IsOptional()
  @IsInt({ message: 'position must be a whole number from 0 to 999' })
  @Min(0, { message: 'position must be a whole number from 0 to 999' })
  @Max(999, { message: 'position must be a whole number from 0 to 999' })
  position?: number;
}
