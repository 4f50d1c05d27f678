import type { AssessmentRound } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';

export class AssessmentRoundDto implements AssessmentRound {
  @ApiProperty()
  id: number;

  @ApiProperty()
  label: string;

  @ApiProperty()
  dayOffset: number;

  @ApiProperty({ type: String, format: 'date', nullable: true, description: 'startDate + dayOffset; null while the trial has no start date.' })
  dueDate: string | null;

  @ApiProperty({ type: [Number] })
  measureIds: number[];
}
