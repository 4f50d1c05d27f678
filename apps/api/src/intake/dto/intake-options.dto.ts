import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsString, MaxLength } from 'class-validator';

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

  @ApiPropertyOptional({
    description:
      'JSON object from a column header to what it holds — plotLabel, block, treatment, notes, missingReason, a measure code — or null to ignore the column. Headers not named are matched automatically.',
    example: '{"Drain (min)": "DRAIN", "comments": "notes"}',
  })
  @IsOptional()
  @IsString({ message: 'mapping must be JSON text' })
  @MaxLength(20_000, { message: 'mapping must be at most 20000 characters' })
  mapping?: string;
}

/** The column overrides of the mapping step, or a sentence saying why they cannot be read. */
export function readMapping(text: string | undefined): Record<string, string | null> | string {
  if (text === undefined || text.trim() === '') return {};
  let parsed: unknown;
  try {
    parsed = JSON.parse(text);
  } catch {
    return 'mapping must be JSON: an object from column header to plotLabel, block, treatment, notes, missingReason, a measure code, or null';
  }
  if (typeof parsed !== 'object' || parsed === null || Array.isArray(parsed)) return 'mapping must be an object from column header to what the column holds';
  for (const [header, choice] of Object.entries(parsed)) {
    if (choice !== null && typeof choice !== 'string') return `mapping for column "${header}" must be text or null`;
  }
  return parsed as Record<string, string | null>;
}

export const flagIsSet = (value: string | undefined): boolean => value === 'true' || value === '1';
