import type { LoginResponse } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { PublicUserDto } from '../../users/dto/public-user.dto';

export class LoginResponseDto implements LoginResponse {
  @ApiProperty()
  accessToken: string;

  @ApiProperty({ enum: ['Bearer'] })
  tokenType: 'Bearer';

  @ApiProperty({ description: 'Seconds until the token expires.' })
  expiresIn: number;

  @ApiProperty({ type: PublicUserDto })
  user: PublicUserDto;
}
