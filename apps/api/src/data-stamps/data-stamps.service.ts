import { Injectable, Logger } from '@nestjs/common';
import { InjectConnection } from '@nestjs/sequelize';
import { randomBytes } from 'node:crypto';
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';

/** The scope every write outside one trial replaces, and that every cached answer also depends on. */
export const ALL_SCOPE = 'all';
export const trialScope = (trialId: number) => `trial:${trialId}`;
/**
 * The scope replaced whenever who may do what changes: a session ended, an account deactivated or its
 * administrator right or name changed, a membership added, changed or removed. Cached sessions and trial
 * memberships are trusted only while it is unchanged.
 */
export const ACCESS_SCOPE = 'access';

/** MariaDB's deadlock (1213), also Galera's answer when another node certified a write to the same row first. */
const isDeadlock = (error: unknown) => (error as { parent?: { errno?: number } }).parent?.errno === 1213;
const logger = new Logger('DataStamps');

/** Replaces the scope's token (retried when another node writes the same row at the same moment); logs and swallows failures. */
export async function replaceStamp(sequelize: Sequelize, scope: string): Promise<void> {
  for (let attempt = 1; ; attempt += 1) {
    try {
      await sequelize.query(
        'INSERT INTO data_stamps (scope, stamp, changed_at) VALUES (:scope, :stamp, UTC_TIMESTAMP(3)) ' +
          'ON DUPLICATE KEY UPDATE stamp = VALUES(stamp), changed_at = VALUES(changed_at)',
        { replacements: { scope, stamp: randomBytes(16).toString('hex') }, type: QueryTypes.INSERT },
      );
      return;
    } catch (error) {
      if (isDeadlock(error) && attempt < 5) continue;
      logger.error(`data stamp ${scope} not replaced: ${error instanceof Error ? error.message : String(error)}`);
      return;
    }
  }
}

/**
 * Replaces the access stamp once the change is committed (at once without a transaction). A transaction's
 * commit waits for its after-commit work, so the answer to the change goes out only after the stamp moved.
 * Outside the transaction on purpose: one hot row locked by every change of access would serialize them,
 * and on Galera two nodes writing it at once would fail one whole transaction instead of one retried statement.
 */
export async function replaceAccessStamp(sequelize: Sequelize, transaction?: Transaction | null): Promise<void> {
  if (transaction) transaction.afterCommit(() => replaceStamp(sequelize, ACCESS_SCOPE));
  else await replaceStamp(sequelize, ACCESS_SCOPE);
}

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
  constructor(@InjectConnection() private readonly sequelize: Sequelize) {}

  /** Per set of scopes: the stamp read under way, and the one queued behind it for requests that came later. */
  private readonly reads = new Map<string, { running: Promise<string> | null; queued: Promise<string> | null }>();

  /**
   * The combined stamp of the whole instance and one trial: changes whenever either is written.
   * Always from a read sent after the call, so it sees every write answered before; concurrent callers
   * share reads (at most one under way and one queued per trial), so fifty requests at once cost two reads.
   */
  read(trialId: number): Promise<string> {
    return this.shared([ALL_SCOPE, trialScope(trialId)]);
  }

  /** The access stamp (ACCESS_SCOPE), read as read() reads: sent after the call, shared by concurrent callers. */
  readAccess(): Promise<string> {
    return this.shared([ACCESS_SCOPE]);
  }

  /** The access stamp read once per request, by whichever check needs it first (the request keeps the promise). */
  accessStampOf(request: { accessStamp?: Promise<string> }): Promise<string> {
    request.accessStamp ??= this.readAccess();
    return request.accessStamp;
  }

  private shared(scopes: string[]): Promise<string> {
    const key = scopes.join(';');
    let slot = this.reads.get(key);
    if (!slot) {
      slot = { running: null, queued: null };
      this.reads.set(key, slot);
    }
    const current = slot;
    const start = (): Promise<string> => {
      const running: Promise<string> = this.query(scopes).finally(() => {
        if (current.running === running) current.running = null;
        if (!current.running && !current.queued) this.reads.delete(key);
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

  private async query(scopes: string[]): Promise<string> {
    const rows = await this.sequelize.query<{ scope: string; stamp: string }>('SELECT scope, stamp FROM data_stamps WHERE scope IN (:scopes)', {
      replacements: { scopes },
      type: QueryTypes.SELECT,
    });
    return scopes.map((scope) => rows.find((row) => row.scope === scope)?.stamp ?? '-').join(';');
  }

  /** Replaces the scope's token (retried when another node writes the same row at the same moment). */
  touch(scope: string): Promise<void> {
    return replaceStamp(this.sequelize, scope);
  }

  /** Replaces the access stamp, after the transaction's commit when there is one (replaceAccessStamp). */
  touchAccess(transaction?: Transaction | null): Promise<void> {
    return replaceAccessStamp(this.sequelize, transaction);
  }
}
