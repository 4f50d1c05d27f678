import { Inject, Injectable } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import bcrypt from 'bcryptjs';
import { authConfig } from '../config/auth.config';

/**
 * bcrypt with the configured cost (BCRYPT_COST, 12 by default: 2^12 rounds, about a quarter of a second
 * per check on one core of a small server, which is what makes a stolen hash slow to guess). A hash made
 * with a lower cost is replaced at the person's next sign-in.
 */
@Injectable()
export class PasswordHasher {
  private placeholder: Promise<string> | null = null;

  constructor(@Inject(authConfig.KEY) private readonly config: ConfigType<typeof authConfig>) {}

  hash(password: string): Promise<string> {
    return bcrypt.hash(password, this.config.bcryptCost);
  }

  /** Compares with the hash, or with a placeholder of the same cost when there is none, so both take as long. */
  async matches(password: string, hash: string | null | undefined): Promise<boolean> {
    this.placeholder ??= bcrypt.hash('friable-placeholder-password', this.config.bcryptCost);
    const matched = await bcrypt.compare(password, hash ?? (await this.placeholder));
    return Boolean(hash) && matched;
  }

  needsRehash(hash: string): boolean {
    return bcrypt.getRounds(hash) < this.config.bcryptCost;
  }
}
