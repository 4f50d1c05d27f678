import { StatsInputError } from './errors';

/**
 * The largest magnitude an observed value may have: 1e150. Its square (1e300), summed over a million plots, still
 * fits in a double (at most about 1.8e308), so sums of squares never overflow to Infinity or NaN. Values beyond
 * it (1e308, "1e400") are refused in words rather than analysed into NaN.
 */
export const MAX_VALUE_MAGNITUDE = 1e150;

/**
 * Bounded number: the value itself when |value| ≤ MAX_VALUE_MAGNITUDE, for every analysis that squares values.
 * Reference: IEEE 754 binary64 range (largest finite double ≈ 1.797e308).
 * @throws StatsInputError ('value out of range') naming the observation as `where` describes it.
 * @example boundedValue(1e308, 'observation 4'); // throws "value out of range: observation 4 is 1e+308, …"
 */
export function boundedValue(value: number, where: string, shown: string = String(value)): number {
  if (!(Math.abs(value) <= MAX_VALUE_MAGNITUDE)) {
    throw new StatsInputError('value out of range', `${where} is ${shown}; values must lie between −1e150 and 1e150 (larger ones overflow when squared)`);
  }
  return value;
}

/** Observations with their missing values (null) left out, and what the answer should say about them. */
export interface MissingLeftOut<T> {
  readonly kept: readonly T[];
  /** Index of each kept observation in the request. */
  readonly originalIndex: readonly number[];
  readonly leftOut: number;
  /** Plain words for the answer's warnings (empty when nothing was left out). */
  readonly notes: readonly string[];
}

/**
 * Missing values: an observation whose value is null is a plot not measured. It is left out of the analysis,
 * and the answer says how many were left out and names every treatment left with no value at all.
 * Reference: Friable issue #10 ("treat null as missing and say how many were left out").
 * @throws never.
 * @example leaveOutMissing([{ treatment: 'a', value: null }, { treatment: 'a', value: 2 }], (o) => o.treatment).notes;
 *   // ['1 missing value (null) was left out of the analysis.']
 */
export function leaveOutMissing<T extends { readonly value?: unknown }>(observations: readonly T[], treatmentOf: (observation: T) => string): MissingLeftOut<T> {
  const kept: T[] = [];
  const originalIndex: number[] = [];
  const treatments = new Set<string>();
  const withValues = new Set<string>();
  observations.forEach((observation, index) => {
    const treatment = treatmentOf(observation);
    treatments.add(treatment);
    if (observation.value === null) return;
    withValues.add(treatment);
    kept.push(observation);
    originalIndex.push(index);
  });
  const leftOut = observations.length - kept.length;
  if (leftOut === 0) return Object.freeze({ kept: observations, originalIndex, leftOut, notes: Object.freeze([]) });
  const notes = [`${leftOut} missing value${leftOut === 1 ? '' : 's'} (null) ${leftOut === 1 ? 'was' : 'were'} left out of the analysis.`];
  const emptied = [...treatments].filter((treatment) => !withValues.has(treatment));
  if (emptied.length > 0) {
    notes.push(`${emptied.length === 1 ? 'Treatment' : 'Treatments'} ${emptied.join(', ')} ${emptied.length === 1 ? 'has' : 'have'} no values left and ${emptied.length === 1 ? 'is' : 'are'} not in the analysis.`);
  }
  return Object.freeze({ kept, originalIndex, leftOut, notes: Object.freeze(notes) });
}
