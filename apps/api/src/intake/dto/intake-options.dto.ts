import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional } from 'class-validator';

const FLAGS = ['true', 'false', '1', '0'] as const;

/** `?dryRun=true` and `acceptWarnings=true`, as query parameters or multipart form fields. */
export class IntakeOptionsDto {
  @ApiPropertyOptional({ enum: FLAGS, description: 'true: say what the upload would do (new / changed / unchanged) and write nothing.' })
  @IsOptional()
  @IsIn(FLAGS, { message: 'dryRun must be true or false' })
  dryRun?: string;

  @ApiPropertyOptional({ enum: FLAGS, description: 'true: keep values outside the usual range (the warnings) as typed.' })
  @IsOptional()
  @IsIn(FLAGS, { message: 'acceptWarnings must be true or false' })
  acceptWarnings?: string;
}

export const flagIsSet = (value: string | undefined): boolean => value === 'true' || value === '1';
