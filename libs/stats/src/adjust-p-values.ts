import { StatsInputError } from './errors';

/**
 * Bonferroni or Holm adjustment of a family of p-values, returned in input order.
 *
 * Bonferroni multiplies each p by the family size m. Holm's step-down (Holm 1979,
 * Scand. J. Statist. 6:65; as R's p.adjust) multiplies the i-th smallest by
 * m − i + 1 and takes the running maximum, so adjusted values never decrease with
 * the raw ones. Both are capped at 1. Free description:
 * https://en.wikipedia.org/wiki/Holm%E2%80%93Bonferroni_method
 *
 * @throws StatsInputError (a RangeError) when a p-value is outside [0, 1] or not a number.
 * @example adjustPValues([0.01, 0.04, 0.03, 0.005], 'holm') // [0.03, 0.06, 0.06, 0.02]
 */
export function adjustPValues(p: readonly number[], method: 'bonferroni' | 'holm'): number[] {
  p.forEach((value, index) => {
    if (!(value >= 0 && value <= 1)) {
      throw new StatsInputError('invalid p-value', `adjustPValues: p[${index}] must be in [0, 1], got ${value}`);
    }
  });
  const m = p.length;
  if (method === 'bonferroni') return p.map((value) => Math.min(1, value * m));
  const order = p.map((_, index) => index).sort((a, b) => p[a] - p[b]);
  const adjusted = new Array<number>(m);
  let runningMaximum = 0;
  order.forEach((index, rank) => {
    runningMaximum = Math.max(runningMaximum, Math.min(1, (m - rank) * p[index]));
    adjusted[index] = runningMaximum;
  });
  return adjusted;
}
