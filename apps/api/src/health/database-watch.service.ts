import { Inject, Injectable, Logger, type OnApplicationShutdown, type OnModuleInit } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import * as mariadb from 'mariadb';
import { databaseConfig } from '../config/database.config';
import { hostRing, type DatabaseHost } from '../database/database-hosts';

/** How often the database is asked whether it is there, and how long an answer may take. */
const INTERVAL_MS = 500;
const ANSWER_MS = 1_000;
/** Slow answers in a row that mark the database down (one slow answer can be a busy machine). */
const SLOW_CHECKS_DOWN = 2;

/** The driver's "could not connect in time" (errno 45012), or our own deadline: slow, not refused. */
function isSlow(error: unknown): boolean {
  return error instanceof WatchDeadline || (error as { errno?: number } | null)?.errno === 45012;
}

class WatchDeadline extends Error {}

/**
 * Database watch — knows within a second whether the database refuses connections, and within about two and a half
 * seconds whether it has stopped answering, so that
 * requests are refused at once with 503 while it does not (see database-gate.ts) and served again
 * as soon as it does, without a restart.
 *
 * Purpose: a stopped server refuses connections at once, but a frozen one (paused, or cut off by
 * the network) accepts them and never answers, so requests would wait on it. The watch keeps its
 * own connection outside the pool and sends `SELECT 1` every half second; no answer within a
 * second twice in a row marks the database down (the connection is dropped and made anew on the next tick);
 * a refused or broken connection marks it down at once.
 * Throws: nothing; a failed check is a state, logged once per change.
 */
@Injectable()
export class DatabaseWatchService implements OnModuleInit, OnApplicationShutdown {
  private readonly logger = new Logger('Database');
  private connection: mariadb.Connection | null = null;
  private timer: NodeJS.Timeout | null = null;
  private checking = false;
  private up = true;
  private slowChecks = 0;

  constructor(@Inject(databaseConfig.KEY) private readonly config: ConfigType<typeof databaseConfig>) {}

  /** False from the first unanswered check until the next answered one. */
  get isUp(): boolean {
    return this.up;
  }

  onModuleInit(): void {
    this.timer = setInterval(() => void this.check(), INTERVAL_MS);
    this.timer.unref();
  }

  async onApplicationShutdown(): Promise<void> {
    if (this.timer) clearInterval(this.timer);
    this.timer = null;
    this.drop();
  }

  /** One check: answered within ANSWER_MS or not. Also run by the health route. */
  async check(): Promise<boolean> {
    if (this.checking) return this.up;
    this.checking = true;
    let timeout: NodeJS.Timeout | undefined;
    try {
      const answered = this.ping();
      answered.catch(() => undefined); // a late failure, after the race was lost, is no news
      const late = new Promise<never>((_, reject) => {
        timeout = setTimeout(() => reject(new WatchDeadline(`no answer within ${ANSWER_MS} ms`)), ANSWER_MS);
      });
      await Promise.race([answered, late]);
      this.slowChecks = 0;
      this.mark(true);
    } catch (error) {
      this.drop();
      this.slowChecks = isSlow(error) ? this.slowChecks + 1 : SLOW_CHECKS_DOWN;
      if (this.slowChecks >= SLOW_CHECKS_DOWN) this.mark(false, error);
    } finally {
      clearTimeout(timeout);
      this.checking = false;
    }
    return this.up;
  }

  /**
   * With several nodes in DB_HOST: when the node in use does not answer, the next that does becomes the one every
   * new pooled connection goes to (database/database-hosts.ts); the check fails only when none answers.
   */
  private async ping(): Promise<void> {
    const ring = hostRing(this.config.hosts);
    if (ring.hosts.length === 1) return this.pingHost(ring.current);
    let lastError: unknown;
    for (const host of ring.inTurn) {
      try {
        await this.pingHost(host);
        if (host !== ring.current) {
          this.logger.warn(`Database node ${ring.current.host}:${ring.current.port} does not answer; new connections go to ${host.host}:${host.port}.`);
          ring.use(host);
        }
        return;
      } catch (error) {
        this.drop();
        lastError = error;
      }
    }
    throw lastError;
  }

  private async pingHost(host: DatabaseHost): Promise<void> {
    if (!this.connection) {
      const connection = await mariadb.createConnection({
        host: host.host,
        port: host.port,
        user: this.config.username,
        password: this.config.password,
        database: this.config.database,
        connectTimeout: ANSWER_MS,
      });
      // A connection that breaks while idle emits 'error': it is forgotten here (the next tick
      // connects anew) instead of becoming an uncaught exception.
      connection.on('error', () => {
        if (this.connection === connection) this.connection = null;
      });
      if (this.connection) connection.destroy();
      else this.connection = connection;
    }
    await this.connection!.query('SELECT 1');
  }

  private drop(): void {
    const connection = this.connection;
    this.connection = null;
    if (connection) connection.destroy();
  }

  private mark(up: boolean, error?: unknown): void {
    if (up === this.up) return;
    this.up = up;
    if (up) this.logger.warn('The database answers again; requests are served.');
    else this.logger.error(`The database does not answer (${error instanceof Error ? error.message : String(error)}); requests are answered 503 until it does.`);
  }
}
