import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { FactorLevel } from '../factors/models/factor-level.model';
import { TrialFactor } from '../factors/models/trial-factor.model';
import { PlotRow } from '../plots/models/plot.model';
import { TreatmentRow } from '../treatments/models/treatment.model';
import { Trial } from '../trials/models/trial.model';
import { TrialMembership } from '../trials/models/trial-membership.model';
import { SiteRow } from './models/site.model';
import { SitesController } from './sites.controller';
import { SitesService } from './sites.service';

@Module({
  imports: [SequelizeModule.forFeature([SiteRow, PlotRow, TreatmentRow, TrialMembership, Trial, TrialFactor, FactorLevel])],
  controllers: [SitesController],
  providers: [SitesService],
  exports: [SitesService],
})
export class SitesModule {}
