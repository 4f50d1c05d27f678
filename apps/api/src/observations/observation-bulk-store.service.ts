import { Injectable } from '@nestjs/common';
import type { Transaction } from 'sequelize';
import { connectionOf, openBulkStream, type BulkLoadMethod, type BulkStream } from './bulk-stream';

export interface BulkWriteContext {
  readonly trialId: number;
  readonly siteId: number;
  readonly roundId: number;
  readonly userId: number | null;
  /** The intake_uploads row of a commit; null for a dry run (then nothing may be written to observations). */
  readonly uploadId: number | null;
  readonly at: Date;
  /**
   * The measures whose notes the file gives (every measure of the file when it has a notes column for the whole row,
   * else those with a notes column of their own): the stored notes of the others are kept and not compared.
   */
  readonly notedMeasureIds: readonly number[];
  readonly method: BulkLoadMethod;
}

/** The plots a file was checked against: how many, and their lowest and highest id. */
export interface PlotIdSummary {
  readonly count: number;
  readonly lowest: number;
  readonly highest: number;
}

/** A value of the comparison, as the change list shows it (before and after as stored fields). */
export interface ComparedValue {
  readonly kind: 'new' | 'changed' | 'unchanged';
  readonly plotLabel: string;
  readonly measureCode: string;
  readonly before: { valueText: string | null; censored: boolean; missingReason: string | null } | null;
  readonly after: { valueText: string | null; censored: boolean; missingReason: string | null };
}

export interface BulkComparison {
  readonly created: number;
  readonly updated: number;
  readonly unchanged: number;
  /** Changed values first, then new, then unchanged, each in file order; at most `listCap`. */
  readonly listed: readonly ComparedValue[];
}

/** How a staged value compares with the stored one. */
const KIND = { unchanged: 0, new: 1, changed: 2, skipped: 3 } as const;
const kindName = { 0: 'unchanged', 1: 'new', 2: 'changed' } as const;

/** The fields of the lines Intake streams: `seq, plot_id, measure_id, value_text, value_decimal, censored, missing_reason, notes, blank`. */
const LINE_FIELDS = ['seq', 'plot_id', 'measure_id', 'value_text', 'value_decimal', 'censored', 'missing_reason', 'notes', 'blank'] as const;
const HISTORY_COLUMNS =
  'observation_id, trial_id, at, user_id, source, upload_id, had_before, before_text, before_censored, before_missing_reason, after_text, after_censored, after_missing_reason';

/** MariaDB DATETIME(3) text in UTC (the connection's time zone is +00:00). */
const sqlTime = (at: Date): string => at.toISOString().slice(0, 23).replace('T', ' ');

/** Exact comparison of two text columns (no case folding, no trailing-space padding). */
const same = (stored: string, staged: string) => `(${stored} COLLATE utf8mb4_nopad_bin <=> ${staged})`;

interface CountRow {
  kind: number;
  n: number | bigint;
}

interface ListedRow {
  kind: 0 | 1 | 2;
  plotLabel: string;
  measureCode: string;
  hadBefore: number;
  beforeText: string | null;
  beforeCensored: number;
  beforeReason: string | null;
  afterText: string | null;
  afterCensored: number;
  afterReason: string | null;
}

/**
 * Observation bulk store — writes a whole upload's values and their audit trail with a few
 * set-based statements inside the caller's transaction, after comparing them with what is stored
 * in the database itself.
 *
 * Purpose: Intake at the database's own speed. Values are streamed in while the file is still
 * being checked (`LOAD DATA LOCAL INFILE` from a registered stream). A site and round without
 * values takes them straight into observations, and one statement then writes their history;
 * otherwise they go into a temporary staging table, one statement marks each value new, changed or
 * unchanged against the stored one (exact text, censoring, the reason of a missing value, and the
 * notes when the file has them), and four more write the history of the changed values, replace
 * them (version + 1), add the new ones and write their history. Values an upload does not mention
 * are never touched; a refused file is rolled back with the caller's transaction.
 * Reference: MariaDB, LOAD DATA INFILE, https://mariadb.com/kb/en/load-data-infile/; multi-table
 * UPDATE, https://mariadb.com/kb/en/update/.
 * Throws: Error when a bulk load loses or alters a row (the transaction must then roll back).
 * Example: `const stream = await bulk.openFresh(transaction, context); stream.write(line); await stream.end(); await bulk.recordNewHistory(transaction, context)`
 */
@Injectable()
export class ObservationBulkStore {
  /**
   * Locks the site and round's stored values for the rest of the transaction and counts them
   * (0: the upload can go straight into the table).
   */
  async lockStored(transaction: Transaction, trialId: number, siteId: number, roundId: number): Promise<number> {
    const rows = (await connectionOf(transaction).query(
      'SELECT COUNT(*) AS n FROM observations o JOIN plots p ON p.id = o.plot_id WHERE o.trial_id = ? AND o.round_id = ? AND p.site_id = ? FOR UPDATE',
      [trialId, roundId, siteId],
    )) as Array<{ n: number | bigint }>;
    return Number(rows[0]!.n);
  }

  /** Counts the site and round's stored values without locking them (a dry run). */
  async countStored(transaction: Transaction, trialId: number, siteId: number, roundId: number): Promise<number> {
    const rows = (await connectionOf(transaction).query(
      'SELECT COUNT(*) AS n FROM observations o JOIN plots p ON p.id = o.plot_id WHERE o.trial_id = ? AND o.round_id = ? AND p.site_id = ?',
      [trialId, roundId, siteId],
    )) as Array<{ n: number | bigint }>;
    return Number(rows[0]!.n);
  }

  /**
   * Starts adding values straight to observations as they are checked (none may be stored yet
   * for the site and round; a value written meanwhile by someone else makes `end` fail). Empty
   * cells without a reason must not be written to it. Call `recordNewHistory` once it has ended.
   */
  async openFresh(transaction: Transaction, context: BulkWriteContext): Promise<BulkStream> {
    if (context.uploadId === null) throw new RangeError('openFresh: a dry run writes nothing to observations');
    const at = sqlTime(context.at);
    // Every reference of these rows is known good (the site's plots, the round's measures, this trial,
    // round, uploader and upload): checking each row's five keys would cost a quarter of the load, so the
    // keys are checked once per upload by `referencesHold` under the trial's lock instead.
    await connectionOf(transaction).query('SET SESSION foreign_key_checks = 0');
    return openBulkStream(
      transaction,
      {
        table: 'observations',
        fields: LINE_FIELDS.map((field) => (field === 'seq' || field === 'blank' ? null : field)),
        constants: {
          trial_id: context.trialId,
          round_id: context.roundId,
          version: 1,
          source: 'upload',
          upload_id: context.uploadId,
          recorded_by: context.userId,
          recorded_at: at,
          created_at: at,
          updated_at: at,
        },
      },
      context.method,
    );
  }

  /** Creates the temporary staging table (it lives on the transaction's connection) and starts loading values into it. */
  async openStaging(transaction: Transaction, context: BulkWriteContext): Promise<BulkStream> {
    const connection = connectionOf(transaction);
    await connection.query('DROP TEMPORARY TABLE IF EXISTS intake_staging');
    await connection.query(
      `CREATE TEMPORARY TABLE intake_staging (
         seq INT UNSIGNED NOT NULL PRIMARY KEY,
         plot_id INT UNSIGNED NOT NULL,
         measure_id INT UNSIGNED NOT NULL,
         value_text VARCHAR(40) NULL,
         value_decimal DECIMAL(30,10) NULL,
         censored TINYINT(1) NOT NULL,
         missing_reason VARCHAR(200) NULL,
         notes TEXT NULL,
         blank TINYINT(1) NOT NULL,
         kind TINYINT UNSIGNED NOT NULL DEFAULT 0,
         observation_id INT UNSIGNED NULL
       ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_nopad_bin`,
    );
    return openBulkStream(transaction, { table: 'intake_staging', fields: [...LINE_FIELDS], constants: {} }, context.method);
  }

  /** Marks each staged value new, changed, unchanged or skipped (an empty cell where nothing is stored) against the stored one. */
  async classify(transaction: Transaction, context: BulkWriteContext): Promise<void> {
    await connectionOf(transaction).query(
      `UPDATE intake_staging s
         LEFT JOIN observations o ON o.trial_id = ? AND o.plot_id = s.plot_id AND o.round_id = ? AND o.measure_id = s.measure_id
          SET s.observation_id = o.id,
              s.kind = CASE
                WHEN o.id IS NULL THEN IF(s.blank, ${KIND.skipped}, ${KIND.new})
                WHEN ${same('o.value_text', 's.value_text')} AND o.censored = s.censored
                     AND (s.value_text IS NOT NULL OR ${same('o.missing_reason', 's.missing_reason')})
                     AND (FIND_IN_SET(s.measure_id, ?) = 0 OR ${same('o.notes', 's.notes')}) THEN ${KIND.unchanged}
                ELSE ${KIND.changed} END`,
      [context.trialId, context.roundId, context.notedMeasureIds.join(',')],
    );
  }

  /** The staged values' counts and the first `listCap` of them (changed first), before anything is written. */
  async compareStaged(transaction: Transaction, listCap: number): Promise<BulkComparison> {
    const connection = connectionOf(transaction);
    const counts = (await connection.query('SELECT kind, COUNT(*) AS n FROM intake_staging GROUP BY kind')) as CountRow[];
    const countOf = (kind: number) => Number(counts.find((row) => Number(row.kind) === kind)?.n ?? 0);
    const rows = (await connection.query(
      `SELECT s.kind, p.label AS plotLabel, m.code AS measureCode, o.id IS NOT NULL AS hadBefore,
              o.value_text AS beforeText, o.censored AS beforeCensored, o.missing_reason AS beforeReason,
              s.value_text AS afterText, s.censored AS afterCensored, s.missing_reason AS afterReason
         FROM intake_staging s
         JOIN plots p ON p.id = s.plot_id
         JOIN measures m ON m.id = s.measure_id
         LEFT JOIN observations o ON o.id = s.observation_id
        WHERE s.kind IN (${KIND.unchanged}, ${KIND.new}, ${KIND.changed})
        ORDER BY FIELD(s.kind, ${KIND.changed}, ${KIND.new}, ${KIND.unchanged}), s.seq
        LIMIT ?`,
      [listCap],
    )) as ListedRow[];
    return {
      created: countOf(KIND.new),
      updated: countOf(KIND.changed),
      unchanged: countOf(KIND.unchanged),
      listed: rows.map((row) => ({
        kind: kindName[Number(row.kind) as 0 | 1 | 2],
        plotLabel: row.plotLabel,
        measureCode: row.measureCode,
        before: Number(row.hadBefore) ? { valueText: row.beforeText, censored: Boolean(Number(row.beforeCensored)), missingReason: row.beforeReason } : null,
        after: { valueText: row.afterText, censored: Boolean(Number(row.afterCensored)), missingReason: row.afterReason },
      })),
    };
  }

  /** Writes the staged comparison: history of changed values, the changes (version + 1), the new values and their history. */
  async mergeStaged(transaction: Transaction, context: BulkWriteContext): Promise<void> {
    const connection = connectionOf(transaction);
    const at = sqlTime(context.at);
    await connection.query(
      `INSERT INTO observation_changes (${HISTORY_COLUMNS})
       SELECT o.id, o.trial_id, ?, ?, 'upload', ?, 1, o.value_text, o.censored, o.missing_reason, s.value_text, s.censored, s.missing_reason
         FROM intake_staging s JOIN observations o ON o.id = s.observation_id
        WHERE s.kind = ${KIND.changed} ORDER BY s.seq`,
      [at, context.userId, context.uploadId],
    );
    await connection.query(
      `UPDATE observations o JOIN intake_staging s ON o.id = s.observation_id
          SET o.value_text = s.value_text, o.value_decimal = s.value_decimal, o.censored = s.censored, o.missing_reason = s.missing_reason,
              o.notes = IF(FIND_IN_SET(s.measure_id, ?) > 0, s.notes, o.notes), o.version = o.version + 1, o.source = 'upload', o.upload_id = ?,
              o.recorded_by = ?, o.recorded_at = ?, o.updated_at = ?
        WHERE s.kind = ${KIND.changed}`,
      [context.notedMeasureIds.join(','), context.uploadId, context.userId, at, at],
    );
    await connection.query(
      `INSERT INTO observations (trial_id, plot_id, round_id, measure_id, value_text, value_decimal, censored, missing_reason, notes,
                                 version, source, upload_id, recorded_by, recorded_at, created_at, updated_at)
       SELECT ?, s.plot_id, ?, s.measure_id, s.value_text, s.value_decimal, s.censored, s.missing_reason, s.notes, 1, 'upload', ?, ?, ?, ?, ?
         FROM intake_staging s WHERE s.kind = ${KIND.new} ORDER BY s.seq`,
      [context.trialId, context.roundId, context.uploadId, context.userId, at, at, at],
    );
    await this.recordNewHistory(transaction, context);
  }

  /** Turns the per-row key checks back on (after `openFresh`; the connection goes back to the pool afterwards). */
  async restoreKeyChecks(transaction: Transaction): Promise<void> {
    await connectionOf(transaction).query('SET SESSION foreign_key_checks = 1');
  }

  /**
   * Whether the rows of a fresh upload still point at existing records, checked once under the
   * trial's lock (which every change to plots, rounds and measures also takes, so none can follow):
   * the site has the very plots the file was checked against (same count, lowest and highest id:
   * a re-randomized site has new ids), and the round, its measures and the uploader exist.
   */
  async referencesHold(transaction: Transaction, context: BulkWriteContext, plots: PlotIdSummary, measureIds: readonly number[]): Promise<boolean> {
    const [row] = (await connectionOf(transaction).query(
      `SELECT (SELECT COUNT(*) FROM plots WHERE site_id = ?) AS plots, (SELECT MIN(id) FROM plots WHERE site_id = ?) AS lowest,
              (SELECT MAX(id) FROM plots WHERE site_id = ?) AS highest,
              (SELECT COUNT(*) FROM assessment_rounds WHERE id = ? AND trial_id = ?) AS rounds,
              (SELECT COUNT(*) FROM measures WHERE id IN (?) AND trial_id = ?) AS measures,
              (SELECT COUNT(*) FROM users WHERE id = ?) AS users`,
      [context.siteId, context.siteId, context.siteId, context.roundId, context.trialId, measureIds.length ? measureIds : [0], context.trialId, context.userId ?? 0],
    )) as Array<Record<'plots' | 'lowest' | 'highest' | 'rounds' | 'measures' | 'users', number | bigint | null>>;
    return (
      Number(row!.plots) === plots.count &&
      Number(row!.lowest) === plots.lowest &&
      Number(row!.highest) === plots.highest &&
      Number(row!.rounds) === 1 &&
      Number(row!.measures) === new Set(measureIds).size &&
      (context.userId === null || Number(row!.users) === 1)
    );
  }

  /** Drops the staging table (it lives on the pooled connection, which outlives the transaction). */
  async dropStage(transaction: Transaction): Promise<void> {
    await connectionOf(transaction).query('DROP TEMPORARY TABLE IF EXISTS intake_staging');
  }

  /** The first history row of every value this upload created (found by upload and version within the round). */
  async recordNewHistory(transaction: Transaction, context: BulkWriteContext): Promise<void> {
    await connectionOf(transaction).query(
      `INSERT INTO observation_changes (${HISTORY_COLUMNS})
       SELECT o.id, o.trial_id, o.recorded_at, o.recorded_by, 'upload', o.upload_id, 0, NULL, 0, NULL, o.value_text, o.censored, o.missing_reason
         FROM observations o
        WHERE o.trial_id = ? AND o.round_id = ? AND o.upload_id = ? AND o.version = 1`,
      [context.trialId, context.roundId, context.uploadId],
    );
  }
}
