import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsEmail, IsOptional, IsString, MaxLength, MinLength } from 'class-validator';

export class CreateUserDto {
  @ApiProperty({ example: 'new.person@example.org' })
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(254)
  email: string;

  @ApiProperty({ example: 'Robin Ash' })
  @IsString()
  @MinLength(1, { message: 'name must not be empty' })
  @MaxLength(120)
  name: string;

  @ApiProperty({ minLength: 10, example: 'a long passphrase' })
  @IsString()
  @MinLength(10, { message: 'password must be at least 10 characters long' })
  @MaxLength(200)
  password: string;

  @ApiPropertyOptional({ default: false })
  @IsOptional()
  @IsBoolean()
  isAdmin?: boolean;
}
