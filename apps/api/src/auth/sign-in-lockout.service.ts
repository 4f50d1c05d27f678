import { Inject, Injectable } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { Op, QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { authConfig } from '../config/auth.config';
import { SignInLockout } from './models/sign-in-lockout.model';
import { TooManyAttemptsException } from './too-many-attempts.exception';

/**
 * Lockout delay — how long a subject stays locked after its n-th counted failure: nothing below the
 * threshold, then the base delay doubling with each further failure, capped.
 * @example lockoutSeconds(5, { threshold: 5, baseSeconds: 60, maxSeconds: 3600 }) // → 60; 6 → 120; 7 → 240
 */
export function lockoutSeconds(failures: number, rule: { threshold: number; baseSeconds: number; maxSeconds: number }): number {
  if (failures < rule.threshold) return 0;
  return Math.min(rule.maxSeconds, rule.baseSeconds * 2 ** Math.min(failures - rule.threshold, 30));
}

const CLEAN_EVERY_MS = 10 * 60_000;

/**
 * Sign-in lockout per account (by the e-mail typed, whether or not an account has it) and per client
 * address, kept in MariaDB so every API instance shares it. Each attempt is counted before the password is
 * checked (so parallel guesses cannot slip past the count); a right password then clears the account's
 * count. During a lockout every attempt is refused with 429 and Retry-After, the right password too.
 */
@Injectable()
export class SignInLockoutService {
  private lastClean = 0;

  constructor(
    @InjectModel(SignInLockout) private readonly lockouts: typeof SignInLockout,
    @InjectConnection() private readonly sequelize: Sequelize,
    @Inject(authConfig.KEY) private readonly config: ConfigType<typeof authConfig>,
  ) {}

  /** Counts one attempt for the account and the address, or throws TooManyAttemptsException while either is locked. */
  async admit(email: string, address: string, now = new Date()): Promise<void> {
    await this.cleanOccasionally(now);
    const subjects = [
      { subject: `account:${email}`, scope: 'account' as const, threshold: this.config.loginMaxFailures },
      { subject: `address:${address}`, scope: 'address' as const, threshold: this.config.loginAddressMaxFailures },
    ];
    await this.withDeadlockRetry(() => this.sequelize.transaction(async (transaction) => {
      // Both rows are made or locked exclusively at once, account before address, by every attempt: an INSERT
      // IGNORE would take a shared lock on an existing address row, and two sign-ins from one address (to
      // different accounts) holding it would deadlock on the FOR UPDATE below.
      await this.sequelize.query('INSERT INTO sign_in_lockouts (subject, failures) VALUES (?, 0), (?, 0) ON DUPLICATE KEY UPDATE subject = subject', {
        replacements: subjects.map((s) => s.subject.slice(0, 300)),
        type: QueryTypes.INSERT,
        transaction,
      });
      const rows = await this.lockouts.findAll({ where: { subject: subjects.map((s) => s.subject.slice(0, 300)) }, transaction, lock: transaction.LOCK.UPDATE });
      const locked = subjects
        .map((s) => ({ ...s, row: rows.find((r) => r.subject === s.subject.slice(0, 300)) }))
        .filter((s) => s.row?.lockedUntil && s.row.lockedUntil.getTime() > now.getTime())
        .sort((a, b) => b.row!.lockedUntil!.getTime() - a.row!.lockedUntil!.getTime());
      if (locked.length) throw new TooManyAttemptsException(locked[0].row!.lockedUntil!, locked[0].scope, now);
      for (const { subject, threshold } of subjects) {
        const row = rows.find((r) => r.subject === subject.slice(0, 300))!;
        const stale = !row.lastFailureAt || now.getTime() - row.lastFailureAt.getTime() > this.config.loginForgetSeconds * 1000;
        const failures = (stale ? 0 : row.failures) + 1;
        const seconds = lockoutSeconds(failures, { threshold, baseSeconds: this.config.loginLockSeconds, maxSeconds: this.config.loginLockMaxSeconds });
        await row.update({ failures, lastFailureAt: now, lockedUntil: seconds ? new Date(now.getTime() + seconds * 1000) : null }, { transaction });
      }
    }));
  }

  /** Runs a short transaction again (up to 3 times) when MariaDB chose it as a deadlock's victim (errno 1213). */
  private async withDeadlockRetry<T>(work: () => Promise<T>): Promise<T> {
    for (let attempt = 1; ; attempt += 1) {
      try {
        return await work();
      } catch (error) {
        const errno = (error as { parent?: { errno?: number } }).parent?.errno;
        if (errno !== 1213 || attempt >= 3) throw error;
      }
    }
  }

  /**
   * The password was right: the account starts afresh, and the address gets back the attempt admit()
   * counted (its earlier failures still stand, so signing in to one's own account does not buy guesses).
   */
  async succeeded(email: string, address: string): Promise<void> {
    await this.lockouts.destroy({ where: { subject: `account:${email}`.slice(0, 300) } });
    await this.sequelize.query(
      // MariaDB evaluates SET left to right, so locked_until is decided on the count before the decrement.
      `UPDATE sign_in_lockouts SET locked_until = IF(GREATEST(failures, 1) - 1 < ?, NULL, locked_until),
         failures = GREATEST(failures, 1) - 1 WHERE subject = ?`,
      { replacements: [this.config.loginAddressMaxFailures, `address:${address}`.slice(0, 300)], type: QueryTypes.UPDATE },
    );
  }

  /** A password reset proves the mailbox: the account's count and lockout are cleared. */
  async clearAccount(email: string): Promise<void> {
    await this.lockouts.destroy({ where: { subject: `account:${email}`.slice(0, 300) } });
  }

  private async cleanOccasionally(now: Date): Promise<void> {
    if (now.getTime() - this.lastClean < CLEAN_EVERY_MS) return;
    this.lastClean = now.getTime();
    const forgotten = new Date(now.getTime() - this.config.loginForgetSeconds * 1000);
    await this.lockouts.destroy({
      where: { lastFailureAt: { [Op.lt]: forgotten }, [Op.or]: [{ lockedUntil: null }, { lockedUntil: { [Op.lt]: now } }] },
    });
  }
}
