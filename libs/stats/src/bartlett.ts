import { chiSquareUpperTail } from './chi-square';
import { StatsInputError } from './errors';

/** Bartlett's test result (see bartlettFromVariances). */
export interface BartlettResult {
  /** Bartlett's K², referred to chi-square. */
  readonly statistic: number;
  /** Number of variances − 1. */
  readonly df: number;
  /** Upper-tail chi-square p-value. */
  readonly p: number;
}

/**
 * Bartlett's test of equal variances from the variances themselves, e.g. the error
 * mean squares of several sites before their analyses are pooled:
 * K² = [ν ln s² − Σ ν_i ln s_i²] / [1 + (Σ 1/ν_i − 1/ν) / (3(k − 1))], ν = Σ ν_i,
 * s² = Σ ν_i s_i² / ν, on k − 1 df (Snedecor & Cochran, Statistical Methods, 8th ed.,
 * §13.3; as R's bartlett.test; free description: https://en.wikipedia.org/wiki/Bartlett%27s_test).
 *
 * @throws StatsInputError (a RangeError) for fewer than 2 variances, unequal lengths,
 *   a variance that is not positive or a df that is not positive.
 * @example bartlettFromVariances([0.56533125, 0.31768398], [8, 8]) // { statistic: 0.6168, df: 1, p: 0.4322 } (Gomez wet/dry seasons, STATISTICS.md B.11)
 */
export function bartlettFromVariances(variances: readonly number[], dfs: readonly number[]): BartlettResult {
  if (variances.length !== dfs.length) {
    throw new StatsInputError(
      'unequal lengths',
      `bartlettFromVariances: ${variances.length} variances but ${dfs.length} degrees of freedom`,
    );
  }
  if (variances.length < 2) {
    throw new StatsInputError('too few groups', `bartlettFromVariances needs at least 2 variances, got ${variances.length}`);
  }
  variances.forEach((variance, index) => {
    if (!(variance > 0 && Number.isFinite(variance))) {
      throw new StatsInputError('invalid variance', `bartlettFromVariances: variance ${index + 1} must be positive, got ${variance}`);
    }
    if (!(dfs[index] > 0)) {
      throw new StatsInputError('invalid df', `bartlettFromVariances: df ${index + 1} must be positive, got ${dfs[index]}`);
    }
  });
  const totalDf = dfs.reduce((sum, df) => sum + df, 0);
  const pooled = variances.reduce((sum, variance, i) => sum + dfs[i] * variance, 0) / totalDf;
  const logTerm = totalDf * Math.log(pooled) - variances.reduce((sum, variance, i) => sum + dfs[i] * Math.log(variance), 0);
  const k = variances.length;
  const correction = 1 + (dfs.reduce((sum, df) => sum + 1 / df, 0) - 1 / totalDf) / (3 * (k - 1));
  const statistic = logTerm / correction;
  return Object.freeze({ statistic, df: k - 1, p: chiSquareUpperTail(statistic, k - 1) });
}

/**
 * Bartlett's test of equal variances across groups of raw values (see
 * bartlettFromVariances): each group's sample variance on n − 1 df.
 * @throws StatsInputError (a RangeError) for fewer than 2 groups, a group with fewer
 *   than 2 values, a non-finite value, or a group with zero variance.
 * @example bartlett([[1, 2, 3], [2, 4, 6]]) // { statistic: 0.7141, df: 1, p: 0.3981 } (R: bartlett.test(list(1:3, c(2, 4, 6))))
 */
export function bartlett(groups: readonly (readonly number[])[]): BartlettResult {
  const variances: number[] = [];
  const dfs: number[] = [];
  groups.forEach((group, index) => {
    if (group.length < 2) {
      throw new StatsInputError('too few values', `bartlett: group ${index + 1} needs at least 2 values, got ${group.length}`);
    }
    if (!group.every(Number.isFinite)) {
      throw new StatsInputError('non-finite value', `bartlett: group ${index + 1} has a value that is not a finite number`);
    }
    const mean = group.reduce((sum, value) => sum + value, 0) / group.length;
    variances.push(group.reduce((sum, value) => sum + (value - mean) ** 2, 0) / (group.length - 1));
    dfs.push(group.length - 1);
  });
  return bartlettFromVariances(variances, dfs);
}
