import { TRIAL_ROLES, type Member, type TrialRole } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';

export class MemberDto implements Member {
  @ApiProperty()
  membershipId: number;

  @ApiProperty()
  userId: number;

  @ApiProperty()
  name: string;

  @ApiProperty()
  email: string;

  @ApiProperty({ enum: TRIAL_ROLES, enumName: 'TrialRole' })
  role: TrialRole;

  @ApiProperty({ type: Number, nullable: true })
  siteId: number | null;

  @ApiProperty({ type: String, nullable: true })
  siteName: string | null;

  @ApiProperty({ format: 'date-time' })
  since: string;
}
