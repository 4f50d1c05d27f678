import type { Observation, ObservationHistoryEntry } from '@friable/contracts';
import { Injectable } from '@nestjs/common';
import { InjectConnection } from '@nestjs/sequelize';
import { QueryTypes, type Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { describeStoredValue } from '../intake/parsing';

export interface ObservationFilter {
  siteId?: number;
  roundId?: number;
  measureId?: number;
  /** Only these observations (by id). */
  ids?: number[];
}

interface ObservationSqlRow {
  id: number;
  plotId: number;
  plotLabel: string;
  siteId: number;
  siteName: string;
  block: number;
  treatmentCode: string;
  roundId: number;
  roundLabel: string;
  measureId: number;
  measureCode: string;
  valueText: string | null;
  censored: number | boolean;
  missingReason: string | null;
  notes: string | null;
  version: number;
  recordedById: number | null;
  recordedBy: string | null;
  recordedAt: Date | string;
}

interface HistorySqlRow {
  at: Date | string;
  by: string | null;
  source: 'upload' | 'edit';
  hadBefore: number | boolean;
  beforeText: string | null;
  beforeCensored: number | boolean;
  beforeMissingReason: string | null;
  afterText: string | null;
  afterCensored: number | boolean;
  afterMissingReason: string | null;
}

const iso = (value: Date | string): string => (value instanceof Date ? value : new Date(`${value.replace(' ', 'T')}Z`)).toISOString();

/** An observation row as the API answers it; the number is read from the typed text, never from the DECIMAL column. */
export function presentObservation(row: ObservationSqlRow): Observation {
  return {
    id: Number(row.id),
    plotId: Number(row.plotId),
    plotLabel: row.plotLabel,
    siteId: Number(row.siteId),
    siteName: row.siteName,
    block: Number(row.block),
    treatmentCode: row.treatmentCode,
    roundId: Number(row.roundId),
    roundLabel: row.roundLabel,
    measureId: Number(row.measureId),
    measureCode: row.measureCode,
    valueText: row.valueText,
    valueNumber: row.valueText === null ? null : Number(row.valueText),
    censored: Boolean(row.censored),
    missingReason: row.missingReason,
    notes: row.notes,
    version: Number(row.version),
    recordedById: row.recordedById === null ? null : Number(row.recordedById),
    recordedBy: row.recordedBy,
    recordedAt: iso(row.recordedAt),
  };
}

/**
 * Observation query — the Ledger's reads: observations with their plot, site, block, treatment,
 * round and measure, and one value's history.
 * Throws: nothing (an unknown id gives null or an empty list).
 */
@Injectable()
export class ObservationQueryService {
  constructor(@InjectConnection() private readonly sequelize: Sequelize) {}

  /** The trial's observations, by site, round, block, plot position and measure order. */
  async list(trialId: number, filter: ObservationFilter = {}, transaction?: Transaction): Promise<Observation[]> {
    // Values of an archived measure or round stay stored for the record; they leave every reading.
    const conditions = ['o.trial_id = :trialId', 'r.deleted_at IS NULL', 'm.deleted_at IS NULL'];
    if (filter.siteId !== undefined) conditions.push('p.site_id = :siteId');
    if (filter.roundId !== undefined) conditions.push('o.round_id = :roundId');
    if (filter.measureId !== undefined) conditions.push('o.measure_id = :measureId');
    if (filter.ids !== undefined) {
      if (filter.ids.length === 0) return [];
      conditions.push('o.id IN (:ids)');
    }
    const rows = await this.sequelize.query<ObservationSqlRow>(
      `SELECT o.id, o.plot_id AS plotId, p.label AS plotLabel, p.site_id AS siteId, s.name AS siteName, p.block, t.code AS treatmentCode,
              o.round_id AS roundId, r.label AS roundLabel, o.measure_id AS measureId, m.code AS measureCode,
              o.value_text AS valueText, o.censored, o.missing_reason AS missingReason, o.notes, o.version,
              o.recorded_by AS recordedById, u.name AS recordedBy, o.recorded_at AS recordedAt
         FROM observations o
         JOIN plots p ON p.id = o.plot_id
         JOIN sites s ON s.id = p.site_id
         JOIN treatments t ON t.id = p.treatment_id
         JOIN assessment_rounds r ON r.id = o.round_id
         JOIN measures m ON m.id = o.measure_id
         LEFT JOIN users u ON u.id = o.recorded_by
        WHERE ${conditions.join(' AND ')}
        ORDER BY s.id, r.day_offset, r.id, p.block, p.position, m.position, m.id`,
      { replacements: { trialId, ...filter }, type: QueryTypes.SELECT, transaction },
    );
    return rows.map(presentObservation);
  }

  async one(trialId: number, observationId: number, transaction?: Transaction): Promise<Observation | null> {
    return (await this.list(trialId, { ids: [observationId] }, transaction))[0] ?? null;
  }

  /** Every save of one value, oldest first ("NA (flooded)", ">600", "12.50"). */
  async history(trialId: number, observationId: number): Promise<ObservationHistoryEntry[]> {
    const rows = await this.sequelize.query<HistorySqlRow>(
      `SELECT c.at, u.name AS \`by\`, c.source, c.had_before AS hadBefore, c.before_text AS beforeText, c.before_censored AS beforeCensored,
              c.before_missing_reason AS beforeMissingReason, c.after_text AS afterText, c.after_censored AS afterCensored,
              c.after_missing_reason AS afterMissingReason
         FROM observation_changes c LEFT JOIN users u ON u.id = c.user_id
        WHERE c.trial_id = ? AND c.observation_id = ?
        ORDER BY c.id`,
      { replacements: [trialId, observationId], type: QueryTypes.SELECT },
    );
    return rows.map((row) => ({
      at: iso(row.at),
      by: row.by,
      source: row.source,
      before: row.hadBefore
        ? describeStoredValue({ valueText: row.beforeText, censored: Boolean(row.beforeCensored), missingReason: row.beforeMissingReason })
        : null,
      after: describeStoredValue({ valueText: row.afterText, censored: Boolean(row.afterCensored), missingReason: row.afterMissingReason }),
    }));
  }
}
