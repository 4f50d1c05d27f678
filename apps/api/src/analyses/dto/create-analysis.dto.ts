import { ApiProperty } from '@nestjs/swagger';
import { IsString, Matches, MaxLength } from 'class-validator';
import { FindingsQueryDto } from '../../findings/dto/findings-query.dto';

/**
 * POST /api/trials/:trialId/analyses — the choices of the analysis to save, as GET /findings takes them (`analysis`
 * left out: the model made for the measure; its options: distribution, covariance, family, covariate), and a title.
 */
export class CreateAnalysisDto extends FindingsQueryDto {
  @ApiProperty({ example: 'Drain time, Day 14, all sites' })
  @IsString({ message: 'title must be text of 1 to 200 characters' })
  @Matches(/\S/, { message: 'title must be text of 1 to 200 characters' })
  @MaxLength(200, { message: 'title must be text of 1 to 200 characters' })
  title: string;
}
