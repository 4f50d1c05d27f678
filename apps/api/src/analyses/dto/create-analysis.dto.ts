import { ApiProperty, OmitType } from '@nestjs/swagger';
import { IsString, Matches, MaxLength } from 'class-validator';
import { FindingsQueryDto } from '../../findings/dto/findings-query.dto';

/** POST /api/trials/:trialId/analyses — the choices of the analysis to save (the classical ANOVA), and a title. */
export class CreateAnalysisDto extends OmitType(FindingsQueryDto, ['analysis', 'distribution', 'covariance', 'family', 'covariateMeasureId', 'covariateRoundId'] as const) {
  @ApiProperty({ example: 'Drain time, Day 14, all sites' })
  @IsString({ message: 'title must be text of 1 to 200 characters' })
  @Matches(/\S/, { message: 'title must be text of 1 to 200 characters' })
  @MaxLength(200, { message: 'title must be text of 1 to 200 characters' })
  title: string;
}
