import type { AssessmentRound } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';

export class AssessmentRoundDto implements AssessmentRound {
  @ApiProperty()
  id: number;

  @ApiProperty({ description: 'Bumped by every save; send it back with each edit: another one answers 409 with the current record.' })
  version: number;

  @ApiProperty()
  label: string;

  @ApiProperty()
  dayOffset: number;

  @ApiProperty({ type: String, format: 'date', nullable: true, description: 'startDate + dayOffset; null while the trial has no start date.' })
  dueDate: string | null;

  @ApiProperty({ type: [Number] })
  measureIds: number[];
}
