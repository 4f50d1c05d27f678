import { Logger, type OnApplicationShutdown } from '@nestjs/common';
import { ThrottlerStorageService, type ThrottlerStorage } from '@nestjs/throttler';
import type { ThrottlerStorageRecord } from '@nestjs/throttler/dist/throttler-storage-record.interface';
import { ThrottlerStorageRedisService } from '@nest-lab/throttler-storage-redis';

/**
 * Shared throttler storage — the rate-limit counters of @nestjs/throttler in Redis (REDIS_URL), so every API
 * instance counts the same requests; in this process's memory when REDIS_URL is empty (one instance).
 *
 * When Redis does not answer, requests are counted in memory meanwhile (each instance alone, as before) and
 * the change is logged once each way: flood protection degrades, the service stays up. Commands fail at once
 * while disconnected (no offline queue), so a request never waits for Redis to come back.
 * Example: `ThrottlerModule.forRoot({ throttlers, storage: new SharedThrottlerStorage(process.env.REDIS_URL) })`.
 */
export class SharedThrottlerStorage implements ThrottlerStorage, OnApplicationShutdown {
  private readonly logger = new Logger('RateLimits');
  private readonly local = new ThrottlerStorageService();
  private readonly shared: ThrottlerStorageRedisService | null;
  private sharedDown = false;

  constructor(redisUrl: string | undefined) {
    this.shared = redisUrl
      ? new ThrottlerStorageRedisService(redisUrl, { enableOfflineQueue: false, maxRetriesPerRequest: 0, connectTimeout: 1000, commandTimeout: 1000 })
      : null;
    // ioredis reconnects by itself; its connection errors are reported through increment() below.
    this.shared?.redis.on('error', () => undefined);
  }

  get usesRedis(): boolean {
    return this.shared !== null && !this.sharedDown;
  }

  async increment(key: string, ttl: number, limit: number, blockDuration: number, throttlerName: string): Promise<ThrottlerStorageRecord> {
    if (this.shared) {
      try {
        const record = await this.shared.increment(key, ttl, limit, blockDuration, throttlerName);
        if (this.sharedDown) this.logger.warn('Redis answers again: rate limits are shared by every instance again.');
        this.sharedDown = false;
        return record;
      } catch (error) {
        if (!this.sharedDown) this.logger.error(`Redis does not answer (${error instanceof Error ? error.message : String(error)}): rate limits are counted per instance until it does.`);
        this.sharedDown = true;
      }
    }
    return this.local.increment(key, ttl, limit, blockDuration, throttlerName);
  }

  onApplicationShutdown(): void {
    this.shared?.onModuleDestroy();
    this.local.onApplicationShutdown();
  }
}
