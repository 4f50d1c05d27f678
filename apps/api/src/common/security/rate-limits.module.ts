import { Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { SharedThrottlerStorage } from './shared-throttler-storage';

/** Where the flood-protection counters live: Redis at REDIS_URL (shared by every instance), else memory. */
@Module({
  providers: [
    {
      provide: SharedThrottlerStorage,
      inject: [ConfigService],
      useFactory: (config: ConfigService) => new SharedThrottlerStorage(config.get<string>('REDIS_URL')?.trim() || undefined),
    },
  ],
  exports: [SharedThrottlerStorage],
})
export class RateLimitsModule {}
