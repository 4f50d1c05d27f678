import type { InvitationAcceptInput } from '@friable/contracts';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, IsString, MaxLength } from 'class-validator';

export class AcceptInvitationDto implements InvitationAcceptInput {
  @ApiPropertyOptional({ example: 'Robin Ash', description: 'Needed when no account exists for the invited e-mail.' })
  @IsOptional()
  @IsString({ message: 'name must be text' })
  @MaxLength(120, { message: 'name must be at most 120 characters long' })
  name?: string;

  @ApiPropertyOptional({
    description: 'A new password (at least 12 characters, not a common one) for a new account, or the existing account’s password. Not needed with the bearer token of the invited person.',
  })
  @IsOptional()
  @IsString({ message: 'password must be text' })
  @MaxLength(200, { message: 'password must be at most 200 characters long' })
  password?: string;
}
