import type { PublicUser } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';

/** What the API says about a person: never the password hash. */
export class PublicUserDto implements PublicUser {
  @ApiProperty()
  id: number;

  @ApiProperty()
  email: string;

  @ApiProperty()
  name: string;

  @ApiProperty()
  isAdmin: boolean;

  @ApiProperty()
  isActive: boolean;

  @ApiProperty({ format: 'date-time' })
  createdAt: string;
}
