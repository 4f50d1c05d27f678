import { TRIAL_ROLES, type MemberUpdateInput, type TrialRole } from '@friable/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { ArrayMaxSize, IsArray, IsIn, IsInt, IsOptional, Min } from 'class-validator';

/** PATCH /api/trials/:trialId/members/:userId. */
export class UpdateMemberDto implements MemberUpdateInput {
  @ApiProperty({ enum: TRIAL_ROLES, enumName: 'TrialRole', description: 'The one role the person holds on the trial from now on.' })
  @IsIn(TRIAL_ROLES, { message: `role must be one of ${TRIAL_ROLES.join(', ')}` })
  role: TrialRole;

  @ApiPropertyOptional({ type: [Number], description: 'The sites of a collaborator (one or more); leave out for other roles.' })
  @IsOptional()
  @IsArray({ message: 'siteIds must be a list of site ids' })
  @ArrayMaxSize(200, { message: 'siteIds may name at most 200 sites' })
  @IsInt({ each: true, message: 'siteIds must be whole site ids' })
  @Min(1, { each: true, message: 'siteIds must be whole site ids' })
  siteIds?: number[];
}
