import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { ObservationChangeRow } from './models/observation-change.model';
import { ObservationRow } from './models/observation.model';
import { ObservationBulkStore } from './observation-bulk-store.service';
import { ObservationQueryService } from './observation-query.service';
import { ObservationStoreService } from './observation-store.service';

/** The observations table and its audit trail, shared by Intake and the Ledger. */
@Module({
  imports: [SequelizeModule.forFeature([ObservationRow, ObservationChangeRow])],
  providers: [ObservationStoreService, ObservationQueryService, ObservationBulkStore],
  exports: [ObservationStoreService, ObservationQueryService, ObservationBulkStore],
})
export class ObservationsModule {}
