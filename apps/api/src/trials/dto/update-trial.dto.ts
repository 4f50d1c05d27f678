import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, IsString, MaxLength, MinLength } from 'class-validator';

export class UpdateTrialDto {
  @ApiPropertyOptional({ example: 'Gypsum and compost on heavy clay, second season' })
  @IsOptional()
  @IsString()
  @MinLength(3, { message: 'title must be at least 3 characters long' })
  @MaxLength(200, { message: 'title must be at most 200 characters long' })
  title?: string;
}
