import { HttpException, HttpStatus, Inject, Injectable } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { authConfig } from '../config/auth.config';

/**
 * Counts failed sign-ins per client address in a sliding window. After the allowed number of failures
 * every attempt from that address is refused with 429 until the window has passed, right password or not.
 * The counts live in this process; see docs/operations.md for several API instances.
 */
@Injectable()
export class LoginAttemptsService {
  private readonly failures = new Map<string, number[]>();

  constructor(@Inject(authConfig.KEY) private readonly config: ConfigType<typeof authConfig>) {}

  private recent(address: string, now: number): number[] {
    const windowStart = now - this.config.loginWindowSeconds * 1000;
    const times = (this.failures.get(address) ?? []).filter((t) => t > windowStart);
    if (times.length) this.failures.set(address, times);
    else this.failures.delete(address);
    return times;
  }

  assertAllowed(address: string, now = Date.now()): void {
    const times = this.recent(address, now);
    if (times.length >= this.config.loginMaxFailures) {
      const retryAfter = Math.ceil((times[0] + this.config.loginWindowSeconds * 1000 - now) / 1000);
      throw new HttpException(
        {
          statusCode: 429,
          error: 'Too Many Requests',
          message: `Too many failed sign-in attempts. Please wait ${retryAfter} seconds and try again.`,
        },
        HttpStatus.TOO_MANY_REQUESTS,
      );
    }
  }

  recordFailure(address: string, now = Date.now()): void {
    this.failures.set(address, [...this.recent(address, now), now]);
  }

  recordSuccess(address: string): void {
    this.failures.delete(address);
  }
}
