import { fUpperTailProbability } from './distributions';
import { StatsInputError } from './errors';

/** Median of a non-empty list (simple-statistics' median cannot be required from this CommonJS package). */
function medianOf(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
}

/** Brown–Forsythe test result (see brownForsythe). */
export interface BrownForsytheResult {
  readonly f: number;
  readonly dfBetween: number;
  readonly dfWithin: number;
  readonly p: number;
}

/**
 * Brown–Forsythe test of equal spread (Levene's test centred on the group medians):
 * the one-way ANOVA F of z_ij = |y_ij − median_i| (Brown & Forsythe 1974, JASA 69:364;
 * NIST/SEMATECH e-Handbook §1.3.5.10, https://www.itl.nist.gov/div898/handbook/eda/section3/eda35a.htm;
 * R's car::leveneTest default).
 *
 * @throws StatsInputError (a RangeError) for fewer than 2 groups, an empty group, a
 *   non-finite value, no more values than groups, or distances that do not vary within any group.
 * @example brownForsythe(gearBatches) // NIST gear data: { f: 1.705918, dfBetween: 9, dfWithin: 90, p: 0.099083 }
 */
export function brownForsythe(groups: readonly (readonly number[])[]): BrownForsytheResult {
  if (groups.length < 2) {
    throw new StatsInputError('too few groups', `brownForsythe needs at least 2 groups, got ${groups.length}`);
  }
  groups.forEach((group, index) => {
    if (group.length === 0) throw new StatsInputError('too few values', `brownForsythe: group ${index + 1} is empty`);
    if (!group.every(Number.isFinite)) {
      throw new StatsInputError('non-finite value', `brownForsythe: group ${index + 1} has a value that is not a finite number`);
    }
  });
  const deviations = groups.map((group) => {
    const centre = medianOf(group);
    return group.map((value) => Math.abs(value - centre));
  });
  const total = deviations.reduce((sum, group) => sum + group.length, 0);
  const dfBetween = groups.length - 1;
  const dfWithin = total - groups.length;
  if (dfWithin < 1) {
    throw new StatsInputError('too few values', `brownForsythe needs more values than groups, got ${total} for ${groups.length}`);
  }
  const groupMeans = deviations.map((group) => group.reduce((sum, z) => sum + z, 0) / group.length);
  const grandMean = deviations.flat().reduce((sum, z) => sum + z, 0) / total;
  const betweenSumOfSquares = deviations.reduce((sum, group, i) => sum + group.length * (groupMeans[i] - grandMean) ** 2, 0);
  const withinSumOfSquares = deviations.reduce(
    (sum, group, i) => sum + group.reduce((inner, z) => inner + (z - groupMeans[i]) ** 2, 0),
    0,
  );
  // Every distance equal to its group's mean distance (pairs of plots, say, with the same spread in every group):
  // F would be 0/0 or x/0, which is no answer.
  const scale = deviations.flat().reduce((sum, z) => sum + z * z, 0);
  if (withinSumOfSquares <= 1e-20 * scale) {
    throw new StatsInputError(
      'no variation',
      'the distances from each treatment’s median do not vary within any treatment, so there is nothing to compare the spreads against',
    );
  }
  const f = betweenSumOfSquares / dfBetween / (withinSumOfSquares / dfWithin);
  return Object.freeze({ f, dfBetween, dfWithin, p: fUpperTailProbability(f, dfBetween, dfWithin) });
}
