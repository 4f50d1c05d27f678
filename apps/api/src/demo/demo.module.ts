import { Module } from '@nestjs/common';
import { FactorsModule } from '../factors/factors.module';
import { IntakeModule } from '../intake/intake.module';
import { MeasuresModule } from '../measures/measures.module';
import { RoundsModule } from '../rounds/rounds.module';
import { SitesModule } from '../sites/sites.module';
import { TreatmentsModule } from '../treatments/treatments.module';
import { TrialsModule } from '../trials/trials.module';
import { DemoLoaderService } from './demo-loader.service';
import { DemoObservationsService } from './demo-observations';

@Module({
  imports: [TrialsModule, TreatmentsModule, FactorsModule, MeasuresModule, RoundsModule, SitesModule, IntakeModule],
  providers: [DemoLoaderService, DemoObservationsService],
  exports: [DemoLoaderService],
})
export class DemoModule {}
