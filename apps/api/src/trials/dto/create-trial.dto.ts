import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsString, Matches, MaxLength, MinLength } from 'class-validator';
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
}
