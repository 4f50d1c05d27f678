import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { MeasureRow } from '../measures/models/measure.model';
import { ObservationsModule } from '../observations/observations.module';
import { PlotRow } from '../plots/models/plot.model';
import { AssessmentRoundRow } from '../rounds/models/assessment-round.model';
import { RoundMeasure } from '../rounds/models/round-measure.model';
import { Trial } from '../trials/models/trial.model';
import { LedgerController } from './ledger.controller';
import { LedgerService } from './ledger.service';

/** The observations grid: list, edit with a version, add a value, a value's history. */
@Module({
  imports: [SequelizeModule.forFeature([Trial, PlotRow, AssessmentRoundRow, MeasureRow, RoundMeasure]), ObservationsModule],
  controllers: [LedgerController],
  providers: [LedgerService],
})
export class LedgerModule {}
