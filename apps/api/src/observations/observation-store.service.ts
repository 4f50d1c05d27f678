import { Injectable } from '@nestjs/common';
import { InjectConnection } from '@nestjs/sequelize';
import { QueryTypes, type Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import type { ObservationSource } from './models/observation.model';
import { storableValue } from './storable-value';

/** A value as it is to be stored. */
export interface ValueToWrite {
  readonly plotId: number;
  readonly measureId: number;
  readonly valueText: string | null;
  readonly censored: boolean;
  readonly missingReason: string | null;
  readonly notes: string | null;
}

/** A stored value as the writers compare and replace it. */
export interface StoredObservation extends ValueToWrite {
  readonly id: number;
  readonly version: number;
}

export interface WriteContext {
  readonly trialId: number;
  readonly roundId: number;
  readonly userId: number | null;
  readonly source: ObservationSource;
  readonly uploadId: number | null;
  readonly at: Date;
}

/** Rows per INSERT: a few hundred kilobytes of SQL, well inside max_allowed_packet. */
const BATCH_ROWS = 2000;

const observationColumns =
  'trial_id, plot_id, round_id, measure_id, value_text, value_decimal, censored, missing_reason, notes, version, source, upload_id, recorded_by, recorded_at, created_at, updated_at';

function chunks<T>(items: readonly T[], size = BATCH_ROWS): T[][] {
  const out: T[][] = [];
  for (let start = 0; start < items.length; start += size) out.push(items.slice(start, start + size));
  return out;
}

function decimalOf(value: ValueToWrite): string | null {
  if (value.valueText === null) return null;
  const storable = storableValue(value.valueText);
  if (!storable.ok) throw new RangeError(`observation value must fit the table: ${storable.message}`);
  return storable.decimalText;
}

interface StoredRow {
  id: number;
  plotId: number;
  measureId: number;
  valueText: string | null;
  censored: number | boolean;
  missingReason: string | null;
  notes: string | null;
  version: number;
}

const toStored = (row: StoredRow): StoredObservation => ({
  id: Number(row.id),
  plotId: Number(row.plotId),
  measureId: Number(row.measureId),
  valueText: row.valueText,
  censored: Boolean(row.censored),
  missingReason: row.missingReason,
  notes: row.notes,
  version: Number(row.version),
});

const storedColumns =
  'o.id, o.plot_id AS plotId, o.measure_id AS measureId, o.value_text AS valueText, o.censored, o.missing_reason AS missingReason, o.notes, o.version';

/**
 * Observation store — reads and writes observations and their audit trail in batches, inside the
 * caller's transaction.
 *
 * Purpose: Intake (thousands of values in one transaction) and the Ledger (one value) write
 * through the same code, so every save bumps the version and leaves a history row with the value
 * before and after. New values go in with multi-row INSERT … RETURNING, replaced ones with
 * multi-row INSERT … ON DUPLICATE KEY UPDATE on their id; history rows with multi-row INSERTs.
 * Reference: MariaDB, INSERT … RETURNING, https://mariadb.com/kb/en/insertreturning/
 * Throws: RangeError when a value does not fit the table (the callers check with storableValue first).
 * Example: `await store.write(transaction, context, [{ value, before: null }])` → the ids written
 */
@Injectable()
export class ObservationStoreService {
  constructor(@InjectConnection() private readonly sequelize: Sequelize) {}

  /** Every stored value of a site in a round (locked for update when a transaction is given). */
  async storedForSite(trialId: number, siteId: number, roundId: number, transaction?: Transaction): Promise<StoredObservation[]> {
    const rows = await this.sequelize.query<StoredRow>(
      `SELECT ${storedColumns} FROM observations o JOIN plots p ON p.id = o.plot_id
        WHERE o.trial_id = ? AND o.round_id = ? AND p.site_id = ?${transaction ? ' FOR UPDATE' : ''}`,
      { replacements: [trialId, roundId, siteId], type: QueryTypes.SELECT, transaction },
    );
    return rows.map(toStored);
  }

  /** One stored value by plot, round and measure, locked for update. */
  async storedCell(trialId: number, plotId: number, roundId: number, measureId: number, transaction: Transaction): Promise<StoredObservation | null> {
    const rows = await this.sequelize.query<StoredRow>(
      `SELECT ${storedColumns} FROM observations o WHERE o.trial_id = ? AND o.plot_id = ? AND o.round_id = ? AND o.measure_id = ? FOR UPDATE`,
      { replacements: [trialId, plotId, roundId, measureId], type: QueryTypes.SELECT, transaction },
    );
    return rows.length ? toStored(rows[0]!) : null;
  }

  /** Writes new and replaced values with one history row each; returns the observation id of every value, in order. */
  async write(transaction: Transaction, context: WriteContext, changes: ReadonlyArray<{ value: ValueToWrite; before: StoredObservation | null }>): Promise<number[]> {
    const ids = new Array<number>(changes.length);
    const fresh = changes.map((change, index) => ({ ...change, index })).filter((change) => change.before === null);
    const replaced = changes.map((change, index) => ({ ...change, index })).filter((change) => change.before !== null);
    for (const batch of chunks(fresh)) {
      const rows = await this.sequelize.query<{ id: number }>(
        `INSERT INTO observations (${observationColumns}) VALUES ${batch.map(() => '(?,?,?,?,?,?,?,?,?,1,?,?,?,?,?,?)').join(',')} RETURNING id`,
        { replacements: batch.flatMap(({ value }) => this.rowValues(context, value)), type: QueryTypes.SELECT, transaction },
      );
      rows.forEach((row, position) => (ids[batch[position]!.index] = Number(row.id)));
    }
    for (const batch of chunks(replaced)) {
      await this.sequelize.query(
        `INSERT INTO observations (id, ${observationColumns}) VALUES ${batch.map(() => '(?,?,?,?,?,?,?,?,?,?,1,?,?,?,?,?,?)').join(',')}
         ON DUPLICATE KEY UPDATE value_text = VALUES(value_text), value_decimal = VALUES(value_decimal), censored = VALUES(censored),
           missing_reason = VALUES(missing_reason), notes = VALUES(notes), version = version + 1, source = VALUES(source), upload_id = VALUES(upload_id),
           recorded_by = VALUES(recorded_by), recorded_at = VALUES(recorded_at), updated_at = VALUES(updated_at)`,
        { replacements: batch.flatMap(({ value, before }) => [before!.id, ...this.rowValues(context, value)]), type: QueryTypes.INSERT, transaction },
      );
      batch.forEach(({ before, index }) => (ids[index] = before!.id));
    }
    await this.recordHistory(transaction, context, changes, ids);
    return ids;
  }

  private rowValues(context: WriteContext, value: ValueToWrite): unknown[] {
    return [
      context.trialId,
      value.plotId,
      context.roundId,
      value.measureId,
      value.valueText,
      decimalOf(value),
      value.censored,
      value.missingReason,
      value.notes,
      context.source,
      context.uploadId,
      context.userId,
      context.at,
      context.at,
      context.at,
    ];
  }

  private async recordHistory(
    transaction: Transaction,
    context: WriteContext,
    changes: ReadonlyArray<{ value: ValueToWrite; before: StoredObservation | null }>,
    ids: readonly number[],
  ): Promise<void> {
    const rows = changes.map(({ value, before }, index) => [
      ids[index],
      context.trialId,
      context.at,
      context.userId,
      context.source,
      context.uploadId,
      before !== null,
      before?.valueText ?? null,
      before?.censored ?? false,
      before?.missingReason ?? null,
      value.valueText,
      value.censored,
      value.missingReason,
    ]);
    for (const batch of chunks(rows)) {
      await this.sequelize.query(
        `INSERT INTO observation_changes (observation_id, trial_id, at, user_id, source, upload_id, had_before, before_text, before_censored,
           before_missing_reason, after_text, after_censored, after_missing_reason)
         VALUES ${batch.map(() => '(?,?,?,?,?,?,?,?,?,?,?,?,?)').join(',')}`,
        { replacements: batch.flat(), type: QueryTypes.INSERT, transaction },
      );
    }
  }
}
