import { Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { storageConfig } from './storage.config';
import { StorageService } from './storage.service';

/** File storage on the local disk (STORAGE_DIR, default .data/storage). */
@Module({
  imports: [ConfigModule.forFeature(storageConfig)],
  providers: [StorageService],
  exports: [StorageService],
})
export class StorageModule {}
