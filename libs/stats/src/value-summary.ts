import { StatsInputError } from './errors';

// simple-statistics ships a CommonJS build whose types are ES-module only (see distributions.ts).
// eslint-disable-next-line @typescript-eslint/no-require-imports
const simple = require('simple-statistics') as {
  mean(values: number[]): number;
  median(values: number[]): number;
  sampleStandardDeviation(values: number[]): number;
};

/** The recorded values of one group at a glance (see summarizeValues). */
export interface ValueSummary {
  readonly count: number;
  readonly mean: number;
  /** Sample standard deviation (n − 1 divisor); null for a single value. */
  readonly sd: number | null;
  readonly median: number;
  readonly min: number;
  readonly max: number;
}

/**
 * Value summary — count, arithmetic mean, sample standard deviation (n − 1), median, minimum and maximum
 * of a group of recorded values, before any model: what Findings shows while the analysis is computed.
 * Reference: any introductory text, e.g. Snedecor & Cochran, Statistical Methods, 8th ed., §2.5–2.7;
 * free: https://en.wikipedia.org/wiki/Standard_deviation#Corrected_sample_standard_deviation.
 * As R's length, mean, sd, median, min and max.
 *
 * @throws StatsInputError (a RangeError) for no values or a value that is not a finite number.
 * @example summarizeValues([412, 388, 455, 600, 397, 430]) // { count: 6, mean: 447, sd: 78.6994…, median: 421, min: 388, max: 600 }
 */
export function summarizeValues(values: readonly number[]): ValueSummary {
  if (values.length === 0) throw new StatsInputError('too few points', 'summarizeValues needs at least 1 value, got 0');
  const bad = values.findIndex((value) => !Number.isFinite(value));
  if (bad >= 0) throw new StatsInputError('non-finite value', `summarizeValues: value ${bad + 1} is not a finite number`);
  const list = [...values];
  return Object.freeze({
    count: list.length,
    mean: simple.mean(list),
    sd: list.length > 1 ? simple.sampleStandardDeviation(list) : null,
    median: simple.median(list),
    min: Math.min(...list),
    max: Math.max(...list),
  });
}
