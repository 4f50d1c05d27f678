import type { PasswordChangeInput, PasswordResetConfirmInput, PasswordResetRequestInput } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsString, MaxLength, MinLength } from 'class-validator';

// Length rules of new passwords are checked by passwordProblem (NIST SP 800-63B), which explains them in words.
export class PasswordChangeDto implements PasswordChangeInput {
  @ApiProperty({ description: 'The password in use now.' })
  @IsString({ message: 'current password must be text' })
  @MinLength(1, { message: 'current password must not be empty' })
  @MaxLength(200, { message: 'current password must be at most 200 characters long' })
  currentPassword: string;

  @ApiProperty({ minLength: 12, maxLength: 64, description: 'At least 12 characters; not a common password.' })
  @IsString({ message: 'new password must be text' })
  @MaxLength(200, { message: 'new password must be at most 64 characters long' })
  newPassword: string;
}

export class PasswordResetRequestDto implements PasswordResetRequestInput {
  @ApiProperty({ example: 'investigator@example.org' })
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(254, { message: 'email must be at most 254 characters long' })
  email: string;
}

export class PasswordResetConfirmDto implements PasswordResetConfirmInput {
  @ApiProperty({ description: 'The secret at the end of the e-mailed link APP_URL/reset-password/<token>.' })
  @IsString({ message: 'token must be text' })
  @MaxLength(200, { message: 'token must be at most 200 characters long' })
  token: string;

  @ApiProperty({ minLength: 12, maxLength: 64, description: 'The new password: at least 12 characters; not a common password.' })
  @IsString({ message: 'password must be text' })
  @MaxLength(200, { message: 'password must be at most 64 characters long' })
  password: string;
}
