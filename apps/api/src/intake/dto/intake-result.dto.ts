import type { IntakeProblem, IntakeRefusal, IntakeResult } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';

export class IntakeProblemDto implements IntakeProblem {
  @ApiProperty({ type: Number, nullable: true, description: 'As a spreadsheet numbers it: the header is row 1, the first data row is row 2.' })
  row: number | null;

  @ApiProperty({ type: String, nullable: true, description: 'The column header.' })
  column: string | null;

  @ApiProperty()
  message: string;
}

export class IntakeChangeDto {
  @ApiProperty()
  plotLabel: string;

  @ApiProperty()
  measureCode: string;

  @ApiProperty({ enum: ['new', 'changed', 'unchanged'] })
  kind: 'new' | 'changed' | 'unchanged';

  @ApiProperty({ type: String, nullable: true })
  before: string | null;

  @ApiProperty({ type: String, nullable: true })
  after: string | null;
}

export class IntakeResultDto implements IntakeResult {
  @ApiProperty()
  dryRun: boolean;

  @ApiProperty()
  created: number;

  @ApiProperty()
  updated: number;

  @ApiProperty()
  unchanged: number;

  @ApiProperty({ type: [IntakeProblemDto], description: 'Values outside the plausible range, and similar: accepted only with acceptWarnings=true.' })
  warnings: IntakeProblemDto[];

  @ApiProperty({ type: [IntakeChangeDto], description: 'Per value: what the upload would do (dry run) or did.' })
  changes: IntakeChangeDto[];

  @ApiProperty({ description: 'True when the file is byte-identical to the last committed upload for this site and round.' })
  identicalToPrevious: boolean;

  @ApiProperty()
  message: string;
}

/** 422 answer of the intake: nothing was written. */
export class IntakeRefusalDto implements IntakeRefusal {
  @ApiProperty({ enum: [422] })
  statusCode: 422;

  @ApiProperty()
  error: string;

  @ApiProperty()
  message: string;

  @ApiProperty({ type: [IntakeProblemDto] })
  errors: IntakeProblemDto[];
}
