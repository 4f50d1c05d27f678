import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { FactorsModule } from '../factors/factors.module';
import { AssessmentRoundRow } from '../rounds/models/assessment-round.model';
import { SiteRow } from '../sites/models/site.model';
import { SitesModule } from '../sites/sites.module';
import { TreatmentsModule } from '../treatments/treatments.module';
import { Trial } from '../trials/models/trial.model';
import { PlotRow } from './models/plot.model';
import { PlotsController } from './plots.controller';
import { PlotsService } from './plots.service';

@Module({
  imports: [SequelizeModule.forFeature([PlotRow, SiteRow, AssessmentRoundRow, Trial]), SitesModule, TreatmentsModule, FactorsModule],
  controllers: [PlotsController],
  providers: [PlotsService],
})
export class PlotsModule {}
