import { TRIAL_ROLES, type InvitationInput, type TrialRole } from '@friable/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsEmail, IsIn, IsInt, IsOptional, IsString, MaxLength, Min } from 'class-validator';

export class CreateInvitationDto implements InvitationInput {
  @ApiProperty({ example: 'robin.ash@example.org' })
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(254, { message: 'email must be at most 254 characters long' })
  email: string;

  @ApiProperty({ enum: TRIAL_ROLES })
  @IsIn(TRIAL_ROLES, { message: `role must be one of ${TRIAL_ROLES.join(', ')}` })
  role: TrialRole;

  @ApiPropertyOptional({ type: Number, nullable: true, description: 'Required for collaborators: a site of this trial.' })
  @IsOptional()
  @IsInt({ message: 'siteId must be a whole number' })
  @Min(1, { message: 'siteId must be a whole number' })
  siteId?: number | null;

  @ApiPropertyOptional({ type: String, nullable: true, maxLength: 1000, description: 'A personal note included in the e-mail.' })
  @IsOptional()
  @IsString({ message: 'message must be text' })
  @MaxLength(1000, { message: 'message must be at most 1000 characters long' })
  message?: string | null;
}
