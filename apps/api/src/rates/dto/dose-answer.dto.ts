import { RATE_BASES, type DoseAnswer, type RateBasis } from '@friable/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

export class RatePerSquareMetreDto {
  @ApiProperty()
  value: number;

  @ApiProperty({ enum: ['g/m2', 'L/m2'] })
  unit: 'g/m2' | 'L/m2';
}

export class DoseTotalDto {
  @ApiProperty({ type: Number, nullable: true })
  grams: number | null;

  @ApiProperty({ type: Number, nullable: true })
  kilograms: number | null;

  @ApiProperty({ type: Number, nullable: true })
  pounds: number | null;

  @ApiProperty({ type: Number, nullable: true })
  litres: number | null;

  @ApiProperty({ type: Number, nullable: true })
  gallons: number | null;
}

export class DoseAnswerDto implements DoseAnswer {
  @ApiProperty({ type: Number, nullable: true })
  grams: number | null;

  @ApiProperty({ type: Number, nullable: true })
  kilograms: number | null;

  @ApiProperty({ type: Number, nullable: true })
  ounces: number | null;

  @ApiProperty({ type: Number, nullable: true })
  pounds: number | null;

  @ApiProperty({ type: Number, nullable: true, description: 'Depth rates: the volume.' })
  litres: number | null;

  @ApiProperty({ type: Number, nullable: true })
  gallons: number | null;

  @ApiProperty({ type: RatePerSquareMetreDto })
  ratePerM2: RatePerSquareMetreDto;

  @ApiProperty()
  areaM2: number;

  @ApiProperty({ enum: RATE_BASES, enumName: 'RateBasis' })
  basis: RateBasis;

  @ApiProperty({ type: [String] })
  warnings: string[];

  @ApiPropertyOptional({ type: DoseTotalDto, description: 'When `plots` was given: the amount for all of them with the margin.' })
  total?: DoseTotalDto;
}
