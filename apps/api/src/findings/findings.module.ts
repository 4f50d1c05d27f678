import { Module } from '@nestjs/common';
import { MeasuresModule } from '../measures/measures.module';
import { ObservationsModule } from '../observations/observations.module';
import { RoundsModule } from '../rounds/rounds.module';
import { StatsModule } from '../stats/stats.module';
import { TreatmentsModule } from '../treatments/treatments.module';
import { TrialsModule } from '../trials/trials.module';
import { FindingsCache } from './findings-cache';
import { FindingsController } from './findings.controller';
import { FindingsService } from './findings.service';
import { FindingsSummaryService } from './findings-summary.service';

/** Findings: one measure's analysis from the stored data, through the same engine as /api/stats. */
@Module({
  imports: [TrialsModule, TreatmentsModule, MeasuresModule, RoundsModule, ObservationsModule, StatsModule],
  controllers: [FindingsController],
  providers: [FindingsService, FindingsCache, FindingsSummaryService],
  exports: [FindingsService, FindingsCache],
})
export class FindingsModule {}
