import { StatsInputError } from './errors';
import type { CovarianceDerivative, CovarianceStructure, GroupCovarianceBlock } from './reml/covariance-structure';
import type { CovarianceParameter } from './reml/reml-problem';
import { varianceComponentsStructure } from './reml/variance-components';

/** Within-plot covariance structures of the repeated-measures model. */
export type RepeatedStructureName = 'cs' | 'ar1' | 'unstructured';

/** A covariance structure over a plot's rounds, with how to read its parameters back for people. */
export interface RepeatedStructure extends CovarianceStructure {
  readonly name: RepeatedStructureName;
  /** The fitted parameters by name (variances, correlations), for the answer. */
  describe(theta: Float64Array): Record<string, number>;
}

const logistic = (z: number) => 1 / (1 + Math.exp(-z));

/**
 * Compound symmetry: every pair of a plot's rounds equally correlated, V = σ²_plot·J + σ²·I — a random plot
 * intercept, linear in (σ²_plot, σ²), the parametrization pbkrtest uses for Kenward–Roger. The plot variance may
 * be estimated as 0 (no within-plot correlation); a negative correlation, which nlme's corCompSymm allows, is
 * not fitted.
 * Reference: Pinheiro & Bates (2000), Mixed-Effects Models in S and S-PLUS, §5.3.1; Littell et al. (2006),
 * SAS for Mixed Models, 2nd ed., §5.2.
 * @throws StatsInputError (from the variance components) when the codes' lengths differ.
 * @example compoundSymmetry(plotOf).describe(Float64Array.of(2, 1)); // { plotVariance: 2, residualVariance: 1, correlation: 0.667 }
 */
export function compoundSymmetry(plotOf: Int32Array): RepeatedStructure {
  const base = varianceComponentsStructure([{ name: 'plot', codes: plotOf }], plotOf);
  return Object.freeze({
    ...base,
    block: base.block.bind(base),
    start: base.start.bind(base),
    name: 'cs' as const,
    describe: (theta: Float64Array) => ({ plotVariance: theta[0]!, residualVariance: theta[1]!, correlation: theta[0]! / (theta[0]! + theta[1]!) }),
  });
}

/**
 * First-order autoregressive correlation in continuous time: corr(y_s, y_t) = φ^|s − t| on the rounds' day
 * offsets, so unequally spaced rounds are honoured (nlme's corCAR1). Parameters: the variance σ² and
 * z = logit φ (free), so 0 < φ < 1 always; V is not linear in z, so second derivatives are given.
 * Reference: Jones & Boadi-Boateng (1991), Biometrics 47:161; Pinheiro & Bates (2000), §5.3.3.
 * @throws StatsInputError when times and the data differ in length or a time is not finite.
 * @example continuousAr1(days).describe(Float64Array.of(4, 2)); // { variance: 4, phi: 0.881 } (correlation per day)
 */
export function continuousAr1(times: Float64Array): RepeatedStructure {
  times.forEach((t, i) => {
    if (!Number.isFinite(t)) throw new StatsInputError('invalid time', `the day of observation ${i + 1} is not a number`);
  });
  const gaps = [...new Set(times)].sort((a, b) => a - b);
  const typicalGap = gaps.length > 1 ? (gaps[gaps.length - 1]! - gaps[0]!) / (gaps.length - 1) : 1;
  const parameters: CovarianceParameter[] = [
    { name: 'variance', kind: 'variance', canBeZero: false },
    { name: 'logit phi', kind: 'free' },
  ];
  return Object.freeze({
    name: 'ar1' as const,
    parameters,
    linear: false,
    // A correlation of one half between neighbouring rounds to start.
    start: (olsResidualVariance: number) => Float64Array.of(olsResidualVariance, Math.log(Math.pow(0.5, 1 / typicalGap) / (1 - Math.pow(0.5, 1 / typicalGap)))),
    block(_group: number, rows: Int32Array, theta: Float64Array): GroupCovarianceBlock {
      const n = rows.length;
      const variance = theta[0]!;
      const phi = logistic(theta[1]!);
      const covariance = new Float64Array(n * n);
      const correlation = new Float64Array(n * n);
      const byZ = new Float64Array(n * n);
      const byZZ = new Float64Array(n * n);
      const byVarianceZ = new Float64Array(n * n);
      for (let i = 0; i < n; i++) {
        for (let j = 0; j < n; j++) {
          const d = Math.abs(times[rows[i]!]! - times[rows[j]!]!);
          const r = Math.pow(phi, d);
          correlation[i * n + j] = r;
          covariance[i * n + j] = variance * r;
          // ∂φ^d/∂z = d·φ^d·(1 − φ); ∂²φ^d/∂z² = d·φ^d·(1 − φ)·(d(1 − φ) − φ).
          const first = d * r * (1 - phi);
          byVarianceZ[i * n + j] = first;
          byZ[i * n + j] = variance * first;
          byZZ[i * n + j] = variance * first * (d * (1 - phi) - phi);
        }
      }
      const derivatives: CovarianceDerivative[] = [
        { kind: 'dense', matrix: correlation },
        { kind: 'dense', matrix: byZ },
      ];
      return {
        covariance,
        derivatives,
        secondDerivative: (k: number, l: number) => (k === 0 && l === 0 ? null : k === 1 && l === 1 ? { kind: 'dense', matrix: byZZ } : { kind: 'dense', matrix: byVarianceZ }),
      };
    },
    describe: (theta: Float64Array) => ({ variance: theta[0]!, phi: logistic(theta[1]!) }),
  });
}

/**
 * Unstructured covariance over the rounds: a variance for every round and a covariance for every pair,
 * V = Σ σ_ab (E_ab + E_ba), linear in θ (as SAS's type=UN, and nlme's corSymm with varIdent by round give the same
 * fit). Variances move on the log scale; covariances are free; a trial point whose V is not positive definite
 * is refused by the fit (step halving).
 * Reference: Littell et al. (2006), SAS for Mixed Models, 2nd ed., §5.2; Pinheiro & Bates (2000), §5.3.2.
 * @throws StatsInputError when a round code is outside 0 … rounds − 1.
 * @example unstructured(roundOf, ['Day 0', 'Day 14']).parameters.map((p) => p.name); // ['variance[Day 0]', 'covariance[Day 0,Day 14]', 'variance[Day 14]']
 */
export function unstructured(roundOf: Int32Array, roundLabels: readonly string[]): RepeatedStructure {
  const rounds = roundLabels.length;
  roundOf.forEach((r, i) => {
    if (!(r >= 0 && r < rounds)) throw new StatsInputError('invalid round', `observation ${i + 1} has no round`);
  });
  const index: number[][] = Array.from({ length: rounds }, () => new Array<number>(rounds).fill(-1));
  const parameters: CovarianceParameter[] = [];
  for (let a = 0; a < rounds; a++) {
    for (let b = a; b < rounds; b++) {
      index[a]![b] = index[b]![a] = parameters.length;
      parameters.push(a === b ? { name: `variance[${roundLabels[a]}]`, kind: 'variance', canBeZero: false } : { name: `covariance[${roundLabels[a]},${roundLabels[b]}]`, kind: 'free' });
    }
  }
  return Object.freeze({
    name: 'unstructured' as const,
    parameters,
    linear: true,
    start: (olsResidualVariance: number) => Float64Array.from(parameters, (p) => (p.kind === 'variance' ? olsResidualVariance : 0.3 * olsResidualVariance)),
    block(_group: number, rows: Int32Array, theta: Float64Array): GroupCovarianceBlock {
      const n = rows.length;
      const covariance = new Float64Array(n * n);
      for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) covariance[i * n + j] = theta[index[roundOf[rows[i]!]!]![roundOf[rows[j]!]!]!]!;
      const derivatives: CovarianceDerivative[] = parameters.map((_, k) => {
        const matrix = new Float64Array(n * n);
        let any = false;
        for (let i = 0; i < n; i++) {
          for (let j = 0; j < n; j++) {
            if (index[roundOf[rows[i]!]!]![roundOf[rows[j]!]!] === k) {
              matrix[i * n + j] = 1;
              any = true;
            }
          }
        }
        return any ? { kind: 'dense' as const, matrix } : { kind: 'zero' as const };
      });
      return { covariance, derivatives };
    },
    describe: (theta: Float64Array) => Object.fromEntries(parameters.map((p, k) => [p.name, theta[k]!])),
  });
}
