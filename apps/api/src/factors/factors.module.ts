import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { TreatmentRow } from '../treatments/models/treatment.model';
import { TreatmentsModule } from '../treatments/treatments.module';
import { Trial } from '../trials/models/trial.model';
import { FactorsController } from './factors.controller';
import { FactorsService } from './factors.service';
import { FactorLevel } from './models/factor-level.model';
import { TrialFactor } from './models/trial-factor.model';

@Module({
  imports: [SequelizeModule.forFeature([TrialFactor, FactorLevel, TreatmentRow, Trial]), TreatmentsModule],
  controllers: [FactorsController],
  providers: [FactorsService],
  exports: [FactorsService],
})
export class FactorsModule {}
