import { TRIAL_DESIGNS, TRIAL_ROLES, TRIAL_STATUSES, type TrialDesign, type TrialRole, type TrialStatus, type TrialSummary } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';

export class TrialSummaryDto implements TrialSummary {
  @ApiProperty()
  id: number;

  @ApiProperty()
  code: string;

  @ApiProperty()
  title: string;

  @ApiProperty({ enum: TRIAL_DESIGNS, enumName: 'TrialDesign' })
  design: TrialDesign;

  @ApiProperty({ enum: TRIAL_STATUSES, enumName: 'TrialStatus' })
  status: TrialStatus;

  @ApiProperty({ enum: TRIAL_ROLES, enumName: 'TrialRole', isArray: true, description: "The caller's roles on this trial (empty for an administrator without one)." })
  myRoles: TrialRole[];

  @ApiProperty({ format: 'date-time' })
  updatedAt: string;
}
