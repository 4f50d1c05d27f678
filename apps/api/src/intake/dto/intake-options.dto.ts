import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsString, Matches, MaxLength } from 'class-validator';

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

  @ApiPropertyOptional({
    description: 'A name of your choosing for this upload (8 to 64 letters, digits or dashes), to follow it at GET /api/trials/:trialId/intake-imports/:ticket while it runs.',
    example: '3f0c9a52-8d0e-4f7b-9a55-0a4d7c2e1b6f',
  })
  @IsOptional()
  @Matches(/^[A-Za-z0-9-]{8,64}$/, { message: 'ticket must be 8 to 64 letters, digits or dashes' })
  ticket?: string;

  @ApiPropertyOptional({
    description: 'The reason for every value written NA (missing) in a row whose missing reason cell is empty, or in a file without that column.',
    example: 'plot flooded',
  })
  @IsOptional()
  @IsString({ message: 'the missing reason for the file must be text' })
  @MaxLength(200, { message: 'the missing reason for the file must be at most 200 characters' })
  missingReason?: string;

  @ApiPropertyOptional({ description: 'For a workbook: the sheet to read (its tab name). The first visible sheet when left out.', example: 'Day 14' })
  @IsOptional()
  @IsString({ message: 'sheet must be text' })
  @MaxLength(100, { message: 'sheet must be at most 100 characters' })
  sheet?: string;
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
