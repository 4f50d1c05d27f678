import { Injectable, Logger } from '@nestjs/common';
import { InjectConnection } from '@nestjs/sequelize';
import { randomBytes } from 'node:crypto';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';

/** The scope every write outside one trial replaces, and that every cached answer also depends on. */
export const ALL_SCOPE = 'all';
export const trialScope = (trialId: number) => `trial:${trialId}`;

/** MariaDB's deadlock (1213), also Galera's answer when another node certified a write to the same row first. */
const isDeadlock = (error: unknown) => (error as { parent?: { errno?: number } }).parent?.errno === 1213;

/**
 * Data stamps — a random token per scope in the shared table data_stamps, replaced after every write, so each
 * API instance can tell in one primary-key read whether the data behind an answer it computed earlier changed
 * (through itself or any other instance).
 *
 * Tokens are random, not counters: after a restore brings back an older table, a stamp never comes back
 * with a different meaning (npm run restore replaces the 'all' stamp as well).
 * Throws: the database's errors from read(); touch() logs and swallows them after retries (the write itself is done).
 * Example: `await stamps.touch(trialScope(7))`; `await stamps.read(7)` → `"all=…;trial=…"`.
 */
@Injectable()
export class DataStampsService {
  private readonly logger = new Logger('DataStamps');

  constructor(@InjectConnection() private readonly sequelize: Sequelize) {}

  /** Per trial: the stamp read under way, and the one queued behind it for requests that came later. */
  private readonly reads = new Map<number, { running: Promise<string> | null; queued: Promise<string> | null }>();

  /**
   * The combined stamp of the whole instance and one trial: changes whenever either is written.
   * Always from a read sent after the call, so it sees every write answered before; concurrent callers
   * share reads (at most one under way and one queued per trial), so fifty requests at once cost two reads.
   */
  read(trialId: number): Promise<string> {
    let slot = this.reads.get(trialId);
    if (!slot) {
      slot = { running: null, queued: null };
      this.reads.set(trialId, slot);
    }
    const current = slot;
    const start = (): Promise<string> => {
      const running: Promise<string> = this.query(trialId).finally(() => {
        if (current.running === running) current.running = null;
        if (!current.running && !current.queued) this.reads.delete(trialId);
      });
      current.running = running;
      return running;
    };
    if (!current.running) return start();
    // The read under way may have been sent before this caller's write was answered: wait for the next one.
    current.queued ??= current.running
      .catch(() => undefined)
      .then(() => {
        current.queued = null;
        return start();
      });
    return current.queued;
  }

  private async query(trialId: number): Promise<string> {
    const rows = await this.sequelize.query<{ scope: string; stamp: string }>('SELECT scope, stamp FROM data_stamps WHERE scope IN (:scopes)', {
      replacements: { scopes: [ALL_SCOPE, trialScope(trialId)] },
      type: QueryTypes.SELECT,
    });
    const of = (scope: string) => rows.find((row) => row.scope === scope)?.stamp ?? '-';
    return `${of(ALL_SCOPE)};${of(trialScope(trialId))}`;
  }

  /** Replaces the scope's token (retried when another node writes the same row at the same moment). */
  async touch(scope: string): Promise<void> {
    for (let attempt = 1; ; attempt += 1) {
      try {
        await this.sequelize.query(
          'INSERT INTO data_stamps (scope, stamp, changed_at) VALUES (:scope, :stamp, UTC_TIMESTAMP(3)) ' +
            'ON DUPLICATE KEY UPDATE stamp = VALUES(stamp), changed_at = VALUES(changed_at)',
          { replacements: { scope, stamp: randomBytes(16).toString('hex') }, type: QueryTypes.INSERT },
        );
        return;
      } catch (error) {
        if (isDeadlock(error) && attempt < 5) continue;
        this.logger.error(`data stamp ${scope} not replaced: ${error instanceof Error ? error.message : String(error)}`);
        return;
      }
    }
  }
}
