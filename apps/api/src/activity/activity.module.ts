import { Global, Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { ActivityController } from './activity.controller';
import { ActivityService } from './activity.service';
import { ActivityEntryRow } from './models/activity-entry.model';

/** Global so every feature can call ActivityService.record without importing this module. */
@Global()
@Module({
  imports: [SequelizeModule.forFeature([ActivityEntryRow])],
  controllers: [ActivityController],
  providers: [ActivityService],
  exports: [ActivityService],
})
export class ActivityModule {}
