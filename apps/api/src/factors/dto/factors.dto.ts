import { ApiProperty, ApiPropertyOptional, OmitType } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsInt, IsOptional, IsString, Matches, MaxLength, Min, MinLength, ValidateNested } from 'class-validator';
import { CreateTreatmentDto } from '../../treatments/dto/create-treatment.dto';

/** A level: its code and name, and (optional) the rate and material of what is applied, as a treatment's. */
export class FactorLevelDto extends OmitType(CreateTreatmentDto, ['code', 'name', 'isControl', 'position'] as const) {
  @ApiProperty({ example: 'G1', description: '1 to 6 letters or digits, unique within the factor.' })
  @IsString({ message: 'code must be 1 to 6 letters or digits' })
  @Matches(/^[A-Za-z0-9]{1,6}$/, { message: 'code must be 1 to 6 letters or digits' })
  code: string;

  @ApiProperty({ example: 'Gypsum 40 lb/1000 ft²' })
  @IsString({ message: 'name must be text' })
  @MinLength(1, { message: 'name must be 1 to 80 characters long' })
  @MaxLength(80, { message: 'name must be 1 to 80 characters long' })
  name: string;
}

export class FactorDto {
  @ApiProperty({ example: 'Gypsum' })
  @IsString({ message: 'name must be text' })
  @MinLength(1, { message: 'name must be 1 to 80 characters long' })
  @MaxLength(80, { message: 'name must be 1 to 80 characters long' })
  name: string;

  @ApiPropertyOptional({ example: 1, description: 'The version of the factor stored at this place, as GET answered it; needed for every factor that exists. Another one answers 409 with the current factors.' })
  @IsOptional()
  @IsInt({ message: 'version must be a whole number' })
  @Min(1, { message: 'version must be a whole number, 1 or more' })
  version?: number;

  @ApiProperty({ type: [FactorLevelDto] })
  @IsArray({ message: 'levels must list at least two levels' })
  @ArrayMinSize(2, { message: 'levels must list at least two levels' })
  @ArrayMaxSize(12, { message: 'levels must list at most 12 levels' })
  @ValidateNested({ each: true })
  @Type(() => FactorLevelDto)
  levels: FactorLevelDto[];
}

export class FactorsDto {
  @ApiProperty({
    type: [FactorDto],
    description:
      'A factorial takes 2 to 4 factors; a split plot exactly 2 (the whole-plot factor first), a split-split plot 3 (whole plot, sub plot, sub-sub plot). ' +
      'The treatments become every combination of their levels. Same factors and level codes as before: names and rates change in place and the plot layouts stay.',
  })
  @IsArray({ message: 'factors must list 2 to 4 factors' })
  @ArrayMinSize(2, { message: 'factors must list 2 to 4 factors' })
  @ArrayMaxSize(4, { message: 'factors must list 2 to 4 factors' })
  @ValidateNested({ each: true })
  @Type(() => FactorDto)
  factors: FactorDto[];
}
