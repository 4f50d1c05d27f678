import { Module } from '@nestjs/common';
import { AnalysesModule } from '../analyses/analyses.module';
import { FindingsModule } from '../findings/findings.module';
import { ObservationsModule } from '../observations/observations.module';
import { ReportsController } from './reports.controller';
import { ReportsService } from './reports.service';

/** The printable trial report's data. */
@Module({
  imports: [FindingsModule, ObservationsModule, AnalysesModule],
  controllers: [ReportsController],
  providers: [ReportsService],
})
export class ReportsModule {}
