import { ApiProperty } from '@nestjs/swagger';
import { ArrayMaxSize } from 'class-validator';
import { MAX_OBSERVATIONS, ObservationDto } from './anova-request.dto';
import { IsObservationList } from './observation-list.validator';

export class RankTestRequestDto {
  @ApiProperty({ type: [ObservationDto], description: 'Friedman needs treatment and block; Kruskal–Wallis needs treatment.' })
  @ArrayMaxSize(MAX_OBSERVATIONS, { message: `observations must hold at most ${MAX_OBSERVATIONS} rows` })
  @IsObservationList()
  observations: ObservationDto[];
}
