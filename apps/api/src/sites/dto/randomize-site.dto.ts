import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, IsString, Matches } from 'class-validator';

export class RandomizeSiteDto {
  @ApiPropertyOptional({ example: 'clay-2026', description: "Seed text; the trial's seed when left out." })
  @IsOptional()
  @IsString({ message: 'seed must be 1 to 60 characters of text' })
  @Matches(/^\S.{0,59}$/s, { message: 'seed must be 1 to 60 characters of text' })
  seed?: string;
}
