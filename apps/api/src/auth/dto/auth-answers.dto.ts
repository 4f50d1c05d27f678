import type { AccountNotice, LoginResponse, PublicUser, SessionsEnded } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';

/** A person as the API shows them: never the password hash. */
export class PublicUserDto implements PublicUser {
  @ApiProperty() id: number;
  @ApiProperty() email: string;
  @ApiProperty({ description: 'Display name.' }) name: string;
  @ApiProperty() isAdmin: boolean;
  @ApiProperty() isActive: boolean;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
  @ApiProperty({ type: String, nullable: true, example: 'de-DE', description: 'BCP 47 tag for numbers and dates; null follows the browser.' })
  locale: string | null;
  @ApiProperty({ description: 'E-mails about rounds due at the person’s sites.' }) emailReminders: boolean;
  @ApiProperty({ description: 'E-mailed receipts after an upload.' }) emailReceipts: boolean;
  @ApiProperty({ type: String, nullable: true, format: 'date-time' }) lastSignInAt: string | null;
}

export class LoginResponseDto implements LoginResponse {
  @ApiProperty({ description: 'Short-lived access token (JWT, HS256) for the Authorization: Bearer header.' }) accessToken: string;
  @ApiProperty({ enum: ['Bearer'] }) tokenType: 'Bearer';
  @ApiProperty({ description: 'Seconds until the access token expires; sign in again after that.' }) expiresIn: number;
  @ApiProperty({ type: PublicUserDto }) user: PublicUserDto;
}

export class AccountNoticeDto implements AccountNotice {
  @ApiProperty() message: string;
}

export class SessionsEndedDto implements SessionsEnded {
  @ApiProperty() message: string;
  @ApiProperty() sessionsEnded: number;
}
