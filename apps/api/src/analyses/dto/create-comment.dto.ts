import { ApiProperty } from '@nestjs/swagger';
import { IsString, Matches, MaxLength } from 'class-validator';

/** POST /api/trials/:trialId/analyses/:analysisId/comments. */
export class CreateCommentDto {
  @ApiProperty({ example: 'The gypsum plots at Quarry Hill drained oddly fast; worth a look at the plot notes.' })
  @IsString({ message: 'body must be text of 1 to 4000 characters' })
  @Matches(/\S/, { message: 'body must be text of 1 to 4000 characters' })
  @MaxLength(4000, { message: 'body must be text of 1 to 4000 characters' })
  body: string;
}
