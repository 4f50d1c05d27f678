import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { AssessmentRoundRow } from '../rounds/models/assessment-round.model';
import { RoundMeasure } from '../rounds/models/round-measure.model';
import { MeasuresController } from './measures.controller';
import { MeasuresService } from './measures.service';
import { MeasureRow } from './models/measure.model';

@Module({
  imports: [SequelizeModule.forFeature([MeasureRow, RoundMeasure, AssessmentRoundRow])],
  controllers: [MeasuresController],
  providers: [MeasuresService],
  exports: [MeasuresService],
})
export class MeasuresModule {}
