import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsISO8601, IsOptional, IsString, Matches, MaxLength, MinLength } from 'class-validator';
import { TRIAL_DESIGNS, type TrialDesign } from '../models/trial.model';

export class CreateTrialDto {
  @ApiProperty({ example: 'CLAY-27', description: 'Short unique code: letters, digits and dashes.' })
  @IsString()
  @Matches(/^[A-Za-z0-9][A-Za-z0-9-]{1,19}$/, { message: 'code must be 2 to 20 letters, digits or dashes' })
  code: string;

  @ApiProperty({ example: 'Gypsum and compost on heavy clay' })
  @IsString()
  @MinLength(3, { message: 'title must be at least 3 characters long' })
  @MaxLength(200, { message: 'title must be at most 200 characters long' })
  title: string;

  @ApiPropertyOptional({ enum: TRIAL_DESIGNS, default: 'rcbd' })
  @IsOptional()
  @IsIn(TRIAL_DESIGNS, { message: `design must be one of ${TRIAL_DESIGNS.join(', ')}` })
  design?: TrialDesign;

  @ApiPropertyOptional({ type: String, nullable: true, description: 'The question or hypothesis the trial answers.' })
  @IsOptional()
  @IsString({ message: 'question must be text' })
  @MaxLength(2000, { message: 'question must be at most 2000 characters long' })
  question?: string | null;

  @ApiPropertyOptional({ type: String, nullable: true, example: '2026-04-01' })
  @IsOptional()
  @IsISO8601({ strict: true }, { message: 'startDate must be a date like 2026-04-01' })
  @Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'startDate must be a date like 2026-04-01' })
  startDate?: string | null;

  @ApiPropertyOptional({ example: 'clay-2026', description: 'Randomization seed text; a random one when left out.' })
  @IsOptional()
  @IsString({ message: 'seed must be 1 to 60 characters of text' })
  @Matches(/^\S.{0,59}$/s, { message: 'seed must be 1 to 60 characters of text' })
  seed?: string;

  @ApiPropertyOptional({ type: String, nullable: true })
  @IsOptional()
  @IsString({ message: 'safetyNotes must be text' })
  @MaxLength(4000, { message: 'safetyNotes must be at most 4000 characters long' })
  safetyNotes?: string | null;
}
