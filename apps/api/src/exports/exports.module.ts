import { Module } from '@nestjs/common';
import { AnalysesModule } from '../analyses/analyses.module';
import { FindingsModule } from '../findings/findings.module';
import { ObservationsModule } from '../observations/observations.module';
import { ExportsController } from './exports.controller';
import { ExportsService } from './exports.service';

/** Tidy CSV with its data dictionary, and the workbook. */
@Module({
  imports: [FindingsModule, ObservationsModule, AnalysesModule],
  controllers: [ExportsController],
  providers: [ExportsService],
})
export class ExportsModule {}
