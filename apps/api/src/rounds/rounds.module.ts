import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { MeasureRow } from '../measures/models/measure.model';
import { Trial } from '../trials/models/trial.model';
import { AssessmentRoundRow } from './models/assessment-round.model';
import { RoundMeasure } from './models/round-measure.model';
import { RoundsController } from './rounds.controller';
import { RoundsService } from './rounds.service';

@Module({
  imports: [SequelizeModule.forFeature([AssessmentRoundRow, RoundMeasure, MeasureRow, Trial])],
  controllers: [RoundsController],
  providers: [RoundsService],
  exports: [RoundsService],
})
export class RoundsModule {}
