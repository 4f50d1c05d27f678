import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { ObservationChangeRow } from './models/observation-change.model';
import { ObservationRow } from './models/observation.model';
import { ObservationQueryService } from './observation-query.service';
import { ObservationStoreService } from './observation-store.service';

/** The observations table and its audit trail, shared by Intake and the Ledger. */
@Module({
  imports: [SequelizeModule.forFeature([ObservationRow, ObservationChangeRow])],
  providers: [ObservationStoreService, ObservationQueryService],
  exports: [ObservationStoreService, ObservationQueryService],
})
export class ObservationsModule {}
