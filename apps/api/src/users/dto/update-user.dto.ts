import type { MySettingsInput, UserUpdateInput } from '@friable/contracts';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsEmail, IsOptional, IsString, Matches, MaxLength, ValidateIf } from 'class-validator';

/** PATCH /api/users/me: what each person sets for themselves. */
export class MySettingsDto implements MySettingsInput {
  @ApiPropertyOptional({ example: 'Robin Ash', description: 'Display name, shown on the Team, in the Activity and on sign-offs.' })
  @IsOptional()
  @IsString({ message: 'name must be text' })
  @Matches(/\S/, { message: 'name must not be empty' })
  @MaxLength(120, { message: 'name must be at most 120 characters long' })
  name?: string;

  @ApiPropertyOptional({ type: String, nullable: true, example: 'de-DE', description: 'BCP 47 tag for numbers and dates (de-DE writes 1,5); null follows the browser.' })
  @IsOptional()
  @ValidateIf((_object, value) => value !== null)
  @IsString({ message: 'locale must be a language tag such as en-GB or de-DE' })
  @MaxLength(20, { message: 'locale must be a language tag such as en-GB or de-DE' })
  locale?: string | null;

  @ApiPropertyOptional({ description: 'E-mails when a round is due at one’s sites.' })
  @IsOptional()
  @IsBoolean({ message: 'emailReminders must be true or false' })
  emailReminders?: boolean;

  @ApiPropertyOptional({ description: 'An e-mailed receipt after each upload.' })
  @IsOptional()
  @IsBoolean({ message: 'emailReceipts must be true or false' })
  emailReceipts?: boolean;
}

/** PATCH /api/users/:userId (administrator). */
export class UpdateUserDto extends MySettingsDto implements UserUpdateInput {
  @ApiPropertyOptional({ example: 'robin.ash@example.org' })
  @IsOptional()
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(254, { message: 'email must be at most 254 characters long' })
  email?: string;

  @ApiPropertyOptional({ description: 'Instance administrator.' })
  @IsOptional()
  @IsBoolean({ message: 'isAdmin must be true or false' })
  isAdmin?: boolean;

  @ApiPropertyOptional({ description: 'false deactivates the account and ends its sessions; true reactivates it with no session.' })
  @IsOptional()
  @IsBoolean({ message: 'isActive must be true or false' })
  isActive?: boolean;
}
