import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { FactorsModule } from '../factors/factors.module';
import { TrialFactor } from '../factors/models/trial-factor.model';
import { MeasuresModule } from '../measures/measures.module';
import { RoundsModule } from '../rounds/rounds.module';
import { SitesModule } from '../sites/sites.module';
import { TreatmentsModule } from '../treatments/treatments.module';
import { Trial } from './models/trial.model';
import { TrialDeparture } from './models/trial-departure.model';
import { TrialMembership } from './models/trial-membership.model';
import { TrialMembershipsService } from './trial-memberships.service';
import { TrialsController } from './trials.controller';
import { TrialsService } from './trials.service';

@Module({
  imports: [SequelizeModule.forFeature([Trial, TrialMembership, TrialFactor, TrialDeparture]), TreatmentsModule, MeasuresModule, RoundsModule, SitesModule, FactorsModule],
  controllers: [TrialsController],
  providers: [TrialsService, TrialMembershipsService],
  exports: [TrialMembershipsService, TrialsService],
})
export class TrialsModule {}
