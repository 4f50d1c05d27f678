import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, IsString, MaxLength } from 'class-validator';

/** The typed confirmation a removal that archives recorded data needs: the trial's code, as the person typed it. */
export class RemovalConfirmQueryDto {
  @ApiPropertyOptional({ description: 'The trial code typed to confirm (any case); needed when the removal archives values or photos.', example: 'GT24' })
  @IsOptional()
  @IsString({ message: 'confirmation must be text' })
  @MaxLength(40, { message: 'confirmation must be at most 40 characters' })
  confirm?: string;
}
