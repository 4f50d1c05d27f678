import type { IntakeChange, IntakeColumnChoice, IntakeImport, IntakeProblem, IntakeRefusal, IntakeResult, IntakeStage } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';

// Response schemas of the Intake routes for the OpenAPI page; the shapes are those of @friable/contracts.

export class IntakeProblemDto implements IntakeProblem {
  @ApiProperty({ type: Number, nullable: true, example: 4, description: 'The row a spreadsheet shows (the header is row 1); null for the whole file.' })
  row!: number | null;

  @ApiProperty({ type: String, nullable: true, example: 'drain time (s)', description: 'The column header as written in the file.' })
  column!: string | null;

  @ApiProperty({ example: 'Row 4, drain time (s): "abc" is not a number.' })
  message!: string;
}

export class IntakeChangeDto implements IntakeChange {
  @ApiProperty({ example: 'HL-B1-P01' })
  plotLabel!: string;

  @ApiProperty({ example: 'DRAIN' })
  measureCode!: string;

  @ApiProperty({ enum: ['new', 'changed', 'unchanged'] })
  kind!: 'new' | 'changed' | 'unchanged';

  @ApiProperty({ type: String, nullable: true, example: '12.50' })
  before!: string | null;

  @ApiProperty({ type: String, nullable: true, example: 'NA (bed flooded)' })
  after!: string | null;
}

export class IntakeResultDto implements IntakeResult {
  @ApiProperty()
  dryRun!: boolean;

  @ApiProperty({ example: 27 })
  created!: number;

  @ApiProperty({ example: 0 })
  updated!: number;

  @ApiProperty({ example: 0 })
  unchanged!: number;

  @ApiProperty({ type: [IntakeProblemDto], description: 'Values outside the usual range (to accept with acceptWarnings=true) and notes about columns.' })
  warnings!: IntakeProblemDto[];

  @ApiProperty({ type: [IntakeChangeDto], description: 'Changed values first, then new, then unchanged, each in file order; at most 1,000.' })
  changes!: IntakeChangeDto[];

  @ApiProperty({ example: 0, description: 'Values counted above but not listed in changes.' })
  changesOmitted!: number;

  @ApiProperty()
  identicalToPrevious!: boolean;

  @ApiProperty({ example: 'Saved good.csv for Test Garden, Day 0: 27 new values, 0 changed, 0 unchanged.' })
  message!: string;

  @ApiProperty({ example: '3f0c9a52-8d0e-4f7b-9a55-0a4d7c2e1b6f', description: 'The import record of this upload.' })
  ticket!: string;
}

export class IntakeRefusalDto implements IntakeRefusal {
  @ApiProperty({ enum: [422] })
  statusCode!: 422;

  @ApiProperty({ example: 'Unprocessable Entity' })
  error!: string;

  @ApiProperty({ example: 'Nothing was written: the file has 3 problems in 2 rows. Correct them and upload the whole file again.' })
  message!: string;

  @ApiProperty({ type: [IntakeProblemDto] })
  errors!: IntakeProblemDto[];
}

export class IntakeImportDto implements IntakeImport {
  @ApiProperty()
  ticket!: string;

  @ApiProperty()
  siteId!: number;

  @ApiProperty()
  roundId!: number;

  @ApiProperty({ example: 'hollow-lane-day-0.xlsx' })
  fileName!: string;

  @ApiProperty()
  sizeBytes!: number;

  @ApiProperty({ enum: ['csv', 'xlsx'] })
  format!: 'csv' | 'xlsx';

  @ApiProperty()
  dryRun!: boolean;

  @ApiProperty({ enum: ['checking', 'comparing', 'writing', 'done', 'refused', 'failed', 'interrupted'] })
  stage!: IntakeStage;

  @ApiProperty({ description: 'Data rows read and checked so far.' })
  rowsChecked!: number;

  @ApiProperty({ description: 'Bytes of a CSV file read so far.' })
  bytesRead!: number;

  @ApiProperty({ type: Number, nullable: true, description: 'Values to compare or write, once known.' })
  valuesTotal!: number | null;

  @ApiProperty()
  valuesDone!: number;

  @ApiProperty({ type: String, nullable: true })
  message!: string | null;

  @ApiProperty({ type: String, nullable: true })
  userName!: string | null;

  @ApiProperty({ format: 'date-time' })
  startedAt!: string;

  @ApiProperty({ format: 'date-time' })
  updatedAt!: string;

  @ApiProperty({ type: String, format: 'date-time', nullable: true })
  finishedAt!: string | null;

  @ApiProperty({ type: IntakeResultDto, nullable: true, description: 'The 200 answer, once done.' })
  result!: IntakeResultDto | null;

  @ApiProperty({ type: IntakeRefusalDto, nullable: true, description: 'The 422 answer, once refused.' })
  refusal!: IntakeRefusalDto | null;
}

export class IntakeColumnChoiceDto implements IntakeColumnChoice {
  @ApiProperty({ example: 'secs to drain' })
  header!: string;

  @ApiProperty({ type: String, nullable: true, example: 'DRAIN', description: 'plotLabel, block, treatment, notes, missingReason, a measure code, notes:<measure code> (that measure’s own notes), or null (not read).' })
  choice!: string | null;
}
