import { ApiPropertyOptional, ApiProperty } from '@nestjs/swagger';
import { IsBoolean, IsOptional, IsString, MaxLength } from 'class-validator';

/** The fields an edit and a new value share: the value as typed, the reason it is missing, notes. */
export class ObservationValueFields {
  @ApiProperty({ example: '12.5', description: 'As typed: "12.5", ">600" (not drained by the cut-off), "" or "NA" (missing).' })
  @IsString({ message: 'value must be text such as "12.5", ">600" or "NA"' })
  @MaxLength(60, { message: 'value must be at most 60 characters' })
  value!: string;

  @ApiPropertyOptional({ type: String, example: 'bed flooded', nullable: true, description: 'Why the value is missing (only for a missing value).' })
  @IsOptional()
  @IsString({ message: 'missingReason must be text' })
  @MaxLength(200, { message: 'missingReason must be at most 200 characters' })
  missingReason?: string | null;

  @ApiPropertyOptional({ type: String, nullable: true, description: 'Notes, kept exactly as typed.' })
  @IsOptional()
  @IsString({ message: 'notes must be text' })
  @MaxLength(10_000, { message: 'notes must be at most 10,000 characters' })
  notes?: string | null;

  @ApiPropertyOptional({ description: 'Keep a value outside the usual range as typed.' })
  @IsOptional()
  @IsBoolean({ message: 'acceptWarnings must be true or false' })
  acceptWarnings?: boolean;
}
