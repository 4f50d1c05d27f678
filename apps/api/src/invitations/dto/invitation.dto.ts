import { TRIAL_ROLES, type Invitation, type InvitationAcceptResponse, type InvitationPreview, type TrialRole } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { LoginResponseDto } from '../../auth/dto/auth-answers.dto';

export class InvitationDto implements Invitation {
  @ApiProperty()
  id: number;

  @ApiProperty()
  email: string;

  @ApiProperty({ enum: TRIAL_ROLES, enumName: 'TrialRole' })
  role: TrialRole;

  @ApiProperty({ type: Number, nullable: true })
  siteId: number | null;

  @ApiProperty({ type: String, nullable: true })
  siteName: string | null;

  @ApiProperty({ type: String, nullable: true })
  invitedByName: string | null;

  @ApiProperty({ format: 'date-time' })
  sentAt: string;

  @ApiProperty({ format: 'date-time' })
  expiresAt: string;

  @ApiProperty({ enum: ['pending', 'accepted', 'revoked', 'expired'] })
  status: 'pending' | 'accepted' | 'revoked' | 'expired';
}

export class InvitationPreviewDto implements InvitationPreview {
  @ApiProperty()
  trialCode: string;

  @ApiProperty()
  trialTitle: string;

  @ApiProperty({ enum: TRIAL_ROLES, enumName: 'TrialRole' })
  role: TrialRole;

  @ApiProperty({ type: String, nullable: true })
  siteName: string | null;

  @ApiProperty()
  email: string;

  @ApiProperty({ type: String, nullable: true })
  invitedByName: string | null;

  @ApiProperty({ description: 'True when an account with this e-mail exists: the invitee joins with it instead of creating one.' })
  accountExists: boolean;

  @ApiProperty({ format: 'date-time' })
  expiresAt: string;
}

export class InvitationAcceptResponseDto extends LoginResponseDto implements InvitationAcceptResponse {
  @ApiProperty({ description: 'The trial just joined, so the app can open it.' })
  trialId: number;
}
