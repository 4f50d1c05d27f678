import { Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { storageConfig } from './storage.config';
import { StorageService } from './storage.service';

/** File storage: S3-compatible object storage (STORAGE_BACKEND=s3, S3_*) or the local disk (STORAGE_DIR). */
@Module({
  imports: [ConfigModule.forFeature(storageConfig)],
  providers: [StorageService],
  exports: [StorageService],
})
export class StorageModule {}
