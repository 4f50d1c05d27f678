import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, Min } from 'class-validator';

/** GET /api/trials/:trialId/intake-imports?siteId=&roundId= */
export class IntakeImportsQueryDto {
  @ApiProperty({ description: 'The site of the uploads.' })
  @Type(() => Number)
  @IsInt({ message: 'siteId must be a whole number' })
  @Min(1, { message: 'siteId must be a whole number' })
  siteId!: number;

  @ApiProperty({ description: 'The round of the uploads.' })
  @Type(() => Number)
  @IsInt({ message: 'roundId must be a whole number' })
  @Min(1, { message: 'roundId must be a whole number' })
  roundId!: number;
}
