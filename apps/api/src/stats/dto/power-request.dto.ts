import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsInt, IsNumber, IsOptional, Max, Min } from 'class-validator';

export class PowerRequestDto {
  @ApiProperty({ example: 5, description: 'Number of treatments, including the control.' })
  @IsInt({ message: 'treatments must be a whole number' })
  @Min(2, { message: 'treatments must be at least 2' })
  @Max(100, { message: 'treatments must be at most 100' })
  treatments: number;

  @ApiPropertyOptional({ example: 4, description: 'Blocks per site; leave out together with targetPower to get the blocks needed.' })
  @IsOptional()
  @IsInt({ message: 'blocks must be a whole number' })
  @Min(2, { message: 'blocks must be at least 2' })
  @Max(1000, { message: 'blocks must be at most 1000' })
  blocks?: number;

  @ApiProperty({ example: 15, description: 'Coefficient of variation, %.' })
  @IsNumber({}, { message: 'cv must be a number' })
  @Min(0.01, { message: 'cv must be above 0' })
  @Max(1000, { message: 'cv must be at most 1000' })
  cv: number;

  @ApiProperty({ example: 20, description: 'Smallest difference worth detecting between two treatment means, % of the mean.' })
  @IsNumber({}, { message: 'difference must be a number' })
  @Min(0.01, { message: 'difference must be above 0' })
  @Max(1000, { message: 'difference must be at most 1000' })
  difference: number;

  @ApiPropertyOptional({ default: 0.05 })
  @IsOptional()
  @IsNumber({}, { message: 'alpha must be a number' })
  @Min(0.0001, { message: 'alpha must be at least 0.0001' })
  @Max(0.5, { message: 'alpha must be at most 0.5' })
  alpha?: number;

  @ApiPropertyOptional({ default: 1, description: 'Number of sites the trial runs at.' })
  @IsOptional()
  @IsInt({ message: 'sites must be a whole number' })
  @Min(1, { message: 'sites must be at least 1' })
  @Max(200, { message: 'sites must be at most 200' })
  sites?: number;

  @ApiPropertyOptional({ example: 0.8, description: 'With this and without blocks: answers the smallest number of blocks reaching it.' })
  @IsOptional()
  @IsNumber({}, { message: 'targetPower must be a number' })
  @Min(0.05, { message: 'targetPower must be at least 0.05' })
  @Max(0.999, { message: 'targetPower must be below 1' })
  targetPower?: number;
}
