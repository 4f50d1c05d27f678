import { Module } from '@nestjs/common';
import { DatabaseWatchService } from './database-watch.service';
import { HealthController } from './health.controller';

@Module({ controllers: [HealthController], providers: [DatabaseWatchService], exports: [DatabaseWatchService] })
export class HealthModule {}
