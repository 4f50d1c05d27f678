import { ApiProperty } from '@nestjs/swagger';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsInt, IsString, Max, MaxLength, Min, MinLength } from 'class-validator';

export class CreateRoundDto {
  @ApiProperty({ example: 'Day 14' })
  @IsString({ message: 'label must be text' })
  @MinLength(1, { message: 'label must be 1 to 60 characters long' })
  @MaxLength(60, { message: 'label must be 1 to 60 characters long' })
  label: string;

  @ApiProperty({ example: 14, description: 'Days after the trial start date (due date = start date + offset).' })
  @IsInt({ message: 'dayOffset must be a whole number of days from -365 to 3650' })
  @Min(-365, { message: 'dayOffset must be a whole number of days from -365 to 3650' })
  @Max(3650, { message: 'dayOffset must be a whole number of days from -365 to 3650' })
  dayOffset: number;

  @ApiProperty({ type: [Number], description: 'The measures taken in this round (at least one).' })
  @IsArray({ message: 'measureIds must list at least one measure of this trial' })
  @ArrayMinSize(1, { message: 'measureIds must list at least one measure of this trial' })
  @ArrayMaxSize(100, { message: 'measureIds must list at most 100 measures' })
  @IsInt({ each: true, message: 'measureIds must list measure ids' })
  measureIds: number[];
}
