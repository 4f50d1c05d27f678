import { EXPORT_CSV_COLUMNS, type DataDictionaryRow, type ExportCsvColumn, type Measure, type Observation } from '@friable/contracts';
import { neutraliseFormula } from '../intake/parsing';

export type TidyRow = Record<ExportCsvColumn, string>;

/** What each column of the tidy export holds. */
export const DATA_DICTIONARY: readonly DataDictionaryRow[] = [
  { column: 'trial', meaning: 'The trial code.', type: 'text' },
  { column: 'site', meaning: 'The garden (site) name.', type: 'text' },
  { column: 'block', meaning: 'The block number within the site (1 = first block).', type: 'whole number' },
  { column: 'plot_label', meaning: 'The plot label as on the plot plan (site prefix, block, plot).', type: 'text' },
  { column: 'treatment', meaning: 'The treatment code applied to the plot.', type: 'text' },
  { column: 'round', meaning: 'The assessment round label (e.g. Day 14).', type: 'text' },
  { column: 'measure', meaning: 'The measure code.', type: 'text' },
  { column: 'unit', meaning: 'The unit of the value.', type: 'text' },
  { column: 'value', meaning: 'The value exactly as recorded (decimal text); for a censored value, the limit it exceeded; empty when missing.', type: 'decimal number or empty' },
  { column: 'censored', meaning: 'true when the real value is above the limit (e.g. not drained by the cut-off), else false.', type: 'true or false' },
  { column: 'censor_limit', meaning: 'The limit of a censored value (the measure’s cut-off); empty otherwise.', type: 'decimal number or empty' },
  { column: 'missing_reason', meaning: 'Why the value is missing; empty when there is a value.', type: 'text or empty' },
  { column: 'notes', meaning: 'Notes recorded with the value.', type: 'text or empty' },
  { column: 'recorded_by', meaning: 'Who recorded the value last.', type: 'text or empty' },
  { column: 'recorded_at', meaning: 'When the value was recorded last (UTC, ISO 8601).', type: 'date and time' },
];

/**
 * Tidy export rows — one row per stored value (plot × round × measure) with the columns of
 * EXPORT_CSV_COLUMNS; every text cell passes through neutraliseFormula, the numbers stay as recorded.
 * Reference: Wickham (2014), Tidy Data, J. Stat. Softw. 59(10) — one observation per row, one variable per column.
 * Throws: nothing (a measure not in the list gives an empty unit).
 * @example tidyExportRows('FW-CLAY-26', observations, measures)[0].value; // '12.50'
 */
export function tidyExportRows(trialCode: string, observations: readonly Observation[], measures: readonly Measure[]): TidyRow[] {
  const byId = new Map(measures.map((m) => [m.id, m]));
  const text = (value: string | null) => neutraliseFormula(value ?? '');
  return observations.map((o) => {
    const measure = byId.get(o.measureId);
    const row: TidyRow = {
      trial: text(trialCode),
      site: text(o.siteName),
      block: String(o.block),
      plot_label: text(o.plotLabel),
      treatment: text(o.treatmentCode),
      round: text(o.roundLabel),
      measure: text(o.measureCode),
      unit: text(measure?.unit ?? ''),
      value: o.valueText ?? '',
      censored: o.censored ? 'true' : 'false',
      censor_limit: o.censored ? (o.valueText ?? '') : '',
      missing_reason: text(o.missingReason),
      notes: text(o.notes),
      recorded_by: text(o.recordedBy),
      recorded_at: o.recordedAt,
    };
    return Object.fromEntries(EXPORT_CSV_COLUMNS.map((c) => [c, row[c]])) as TidyRow;
  });
}
