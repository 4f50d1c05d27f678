import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsInt, IsNumber, IsOptional, IsString, Matches, Max, MaxLength, Min, MinLength } from 'class-validator';

const finite = { allowNaN: false, allowInfinity: false };

export class CreateSiteDto {
  @ApiProperty({ example: 'Hollow Lane Community Garden' })
  @IsString({ message: 'name must be text' })
  @MinLength(2, { message: 'name must be 2 to 120 characters long' })
  @MaxLength(120, { message: 'name must be 2 to 120 characters long' })
  name: string;

  @ApiPropertyOptional({ type: String, nullable: true })
  @IsOptional()
  @IsString({ message: 'location must be text' })
  @MaxLength(300, { message: 'location must be at most 300 characters long' })
  location?: string | null;

  @ApiPropertyOptional({ type: String, nullable: true })
  @IsOptional()
  @IsString({ message: 'soilDescription must be text' })
  @MaxLength(2000, { message: 'soilDescription must be at most 2000 characters long' })
  soilDescription?: string | null;

  @ApiProperty({ enum: ['rectangle', 'round'] })
  @IsIn(['rectangle', 'round'], { message: 'shape must be rectangle or round' })
  shape: 'rectangle' | 'round';

  @ApiPropertyOptional({ type: Number, nullable: true, description: 'Rectangle plots.' })
  @IsOptional()
  @IsNumber(finite, { message: 'lengthM must be a number of metres above 0' })
  @Min(0.01, { message: 'lengthM must be a number of metres above 0' })
  @Max(10000, { message: 'lengthM must be at most 10000 m' })
  lengthM?: number | null;

  @ApiPropertyOptional({ type: Number, nullable: true, description: 'Rectangle plots.' })
  @IsOptional()
  @IsNumber(finite, { message: 'widthM must be a number of metres above 0' })
  @Min(0.01, { message: 'widthM must be a number of metres above 0' })
  @Max(10000, { message: 'widthM must be at most 10000 m' })
  widthM?: number | null;

  @ApiPropertyOptional({ type: Number, nullable: true, description: 'Round plots or containers: inside diameter at the soil surface.' })
  @IsOptional()
  @IsNumber(finite, { message: 'diameterCm must be a number of centimetres above 0' })
  @Min(0.1, { message: 'diameterCm must be a number of centimetres above 0' })
  @Max(100000, { message: 'diameterCm must be at most 100000 cm' })
  diameterCm?: number | null;

  @ApiPropertyOptional({ type: Number, nullable: true })
  @IsOptional()
  @IsNumber(finite, { message: 'containerDepthCm must be a number of centimetres above 0' })
  @Min(0.1, { message: 'containerDepthCm must be a number of centimetres above 0' })
  @Max(10000, { message: 'containerDepthCm must be at most 10000 cm' })
  containerDepthCm?: number | null;

  @ApiPropertyOptional({ type: Number, nullable: true, description: 'Soil volume per container, for rates per soil volume.' })
  @IsOptional()
  @IsNumber(finite, { message: 'soilVolumeL must be a number of litres above 0' })
  @Min(0.001, { message: 'soilVolumeL must be a number of litres above 0' })
  @Max(1000000, { message: 'soilVolumeL must be at most 1000000 L' })
  soilVolumeL?: number | null;

  @ApiProperty({ example: 5, description: 'Blocks (replicates for crd).' })
  @IsInt({ message: 'blocks must be a whole number from 1 to 50' })
  @Min(1, { message: 'blocks must be a whole number from 1 to 50' })
  @Max(50, { message: 'blocks must be a whole number from 1 to 50' })
  blocks: number;

  @ApiPropertyOptional({ example: 'HL', description: 'Two or three capital letters; made from the name when left out.' })
  @IsOptional()
  @IsString({ message: 'labelPrefix must be two or three capital letters' })
  @Matches(/^[A-Z]{2,3}$/, { message: 'labelPrefix must be two or three capital letters' })
  labelPrefix?: string;

  @ApiPropertyOptional({ type: Number, nullable: true, description: 'A member of the trial who leads the work at this site.' })
  @IsOptional()
  @IsInt({ message: 'leadUserId must be the id of a member of this trial' })
  leadUserId?: number | null;
}
