import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsString, MaxLength, MinLength } from 'class-validator';

export class LoginDto {
  @ApiProperty({ example: 'investigator@example.org' })
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(254)
  email: string;

  @ApiProperty({ example: 'friable-demo' })
  @IsString()
  @MinLength(1, { message: 'password must not be empty' })
  @MaxLength(200)
  password: string;
}
