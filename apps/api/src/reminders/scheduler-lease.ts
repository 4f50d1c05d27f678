import { Injectable, Logger } from '@nestjs/common';
import { InjectConnection } from '@nestjs/sequelize';
import { randomBytes } from 'node:crypto';
import { hostname } from 'node:os';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';

/**
 * Scheduler lease — elects, through a row of scheduler_leases, the one API instance that runs a scheduled job
 * for the next `seconds`: the first to write the row (or to find it expired) holds it until it expires.
 *
 * A lease row rather than GET_LOCK: user-level locks live in one server and are not replicated by Galera,
 * so two instances on two nodes would both win; a row write is certified cluster-wide, and the loser of a
 * simultaneous write gets a deadlock error, counted here as "not elected". A holder that dies frees the
 * job when its lease expires; nothing to set by hand.
 * Example: `if (await lease.acquire('round-reminders', 900)) await run();`
 */
@Injectable()
export class SchedulerLease {
  private readonly logger = new Logger('Scheduler');
  /** This process, as written into the rows it holds. */
  readonly holder = `${hostname()}:${process.pid}:${randomBytes(4).toString('hex')}`;

  constructor(@InjectConnection() private readonly sequelize: Sequelize) {}

  /** True when this instance holds `name` for the next `seconds` (taken now, or renewed). */
  async acquire(name: string, seconds: number, holder = this.holder): Promise<boolean> {
    const taken = 'expires_at < UTC_TIMESTAMP(3) OR holder = VALUES(holder)';
    try {
      await this.sequelize.query(
        'INSERT INTO scheduler_leases (name, holder, expires_at) VALUES (:name, :holder, UTC_TIMESTAMP(3) + INTERVAL :seconds SECOND) ' +
          // holder first: the second IF then sees whether the row became (or already was) ours.
          `ON DUPLICATE KEY UPDATE holder = IF(${taken}, VALUES(holder), holder), expires_at = IF(holder = VALUES(holder), VALUES(expires_at), expires_at)`,
        { replacements: { name, holder, seconds }, type: QueryTypes.INSERT },
      );
      const [row] = await this.sequelize.query<{ holder: string }>('SELECT holder FROM scheduler_leases WHERE name = :name', { replacements: { name }, type: QueryTypes.SELECT });
      return row?.holder === holder;
    } catch (error) {
      if ((error as { parent?: { errno?: number } }).parent?.errno !== 1213) {
        this.logger.error(`lease ${name} not taken: ${error instanceof Error ? error.message : String(error)}`);
      }
      return false;
    }
  }
}
