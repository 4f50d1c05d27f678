import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsString, Matches, MaxLength, MinLength, ValidateNested } from 'class-validator';

export class FactorLevelDto {
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

  @ApiProperty({ type: [FactorLevelDto] })
  @IsArray({ message: 'levels must list at least two levels' })
  @ArrayMinSize(2, { message: 'levels must list at least two levels' })
  @ArrayMaxSize(12, { message: 'levels must list at most 12 levels' })
  @ValidateNested({ each: true })
  @Type(() => FactorLevelDto)
  levels: FactorLevelDto[];
}

export class FactorsDto {
  @ApiProperty({ type: [FactorDto], description: 'Exactly two factors; the treatments become every combination of their levels.' })
  @IsArray({ message: 'factors must list exactly two factors' })
  @ArrayMinSize(2, { message: 'factors must list exactly two factors' })
  @ArrayMaxSize(2, { message: 'factors must list exactly two factors' })
  @ValidateNested({ each: true })
  @Type(() => FactorDto)
  factors: FactorDto[];
}
