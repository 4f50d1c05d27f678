import { dunnettPValue, dunnettQuantile } from './dunnett';
import { productCorrelationLambdas } from './mean-separation';

/** One treatment's contrast with the control on the model's scale (log time, log rate, log odds). */
export interface ControlContrast {
  readonly treatment: string;
  readonly estimate: number;
  readonly se: number;
  /** Simultaneous limits estimate ± critical · se. */
  readonly lower: number;
  readonly upper: number;
  /** Single-step adjusted two-sided p-value. */
  readonly p: number;
}

export interface ManyToControl {
  /** The simultaneous critical value on the z (or t) scale. */
  readonly critical: number;
  readonly contrasts: readonly ControlContrast[];
}

/** The sentence every answer states beside its adjusted comparisons with the control. */
export function manyToControlStatement(df: number): string {
  return `Comparisons with the control are adjusted for multiplicity by the single-step many-to-one (Dunnett-type) method on Wald ${df === Infinity ? 'z statistics (multivariate normal)' : `t statistics (multivariate t, ${df} df)`}; intervals are simultaneous.`;
}

/**
 * Single-step many-to-one comparisons of model contrasts with the control (Dunnett's method carried to
 * regression estimates): Wald statistics estimate/se, their joint correlation from the estimates'
 * covariance, adjusted p = P(max |Z| ≥ |z|) and simultaneous intervals from the (1 − α) quantile of
 * max |Z|, under a multivariate normal (df = Infinity) or t whose correlation is approximated by the
 * product form λᵢλⱼ fitted to the exact one (exact for one-way layouts).
 * Reference: Hothorn, Bretz & Westfall (2008), Simultaneous inference in general parametric models,
 * Biometrical Journal 50:346; Dunnett (1955), JASA 50:1096.
 * @throws StatsInputError (from dunnett) when there is no contrast or alpha is outside (0, 1).
 * @example manyToControl(['G'], [0.4], Float64Array.of(0.01), Infinity).contrasts[0].p; // 6.3e-5 (two-sided normal, one comparison)
 */
export function manyToControl(treatments: readonly string[], estimates: readonly number[], covariance: Float64Array, df: number, alpha = 0.05): ManyToControl {
  const m = estimates.length;
  const se = estimates.map((_, i) => Math.sqrt(covariance[i * m + i]!));
  const correlation = estimates.map((_, i) => estimates.map((__, j) => covariance[i * m + j]! / (se[i]! * se[j]!)));
  // λ to 4 decimals: nearly equal λ (balanced layouts) then share one factor of the integrand, which makes the
  // integral as cheap as for equal replication; the change in p is below 1e-5.
  const lambdas = productCorrelationLambdas(correlation).map((lambda) => Math.round(lambda * 1e4) / 1e4);
  const critical = dunnettQuantile(alpha, lambdas, df);
  const contrasts = estimates.map((estimate, i) =>
    Object.freeze({
      treatment: treatments[i]!,
      estimate,
      se: se[i]!,
      lower: estimate - critical * se[i]!,
      upper: estimate + critical * se[i]!,
      p: Math.min(1, Math.max(0, dunnettPValue(estimate / se[i]!, lambdas, df))),
    }),
  );
  return Object.freeze({ critical, contrasts: Object.freeze(contrasts) });
}

/**
 * The treatment-versus-control contrasts of a fitted model whose treatment columns are named
 * `treatment[level]` with the control as reference: each column's estimate, the covariance of those that
 * could be estimated, and their single-step comparisons (`manyToControl`).
 * @throws as manyToControl.
 * @example treatmentContrasts(['C', 'G'], 'C', names, beta, (a, b) => cov[a][b], Infinity); // { critical, contrasts: [{ treatment: 'G', … }] }
 */
export function treatmentContrasts(
  treatments: readonly string[],
  control: string,
  columnNames: readonly string[],
  coefficients: Float64Array,
  covarianceOf: (columnA: number, columnB: number) => number,
  df: number,
  alpha = 0.05,
): ManyToControl | null {
  const compared = treatments.filter((t) => t !== control);
  const columns = compared.map((t) => columnNames.indexOf(`treatment[${t}]`));
  const usable = compared.map((t, k) => ({ treatment: t, column: columns[k]! })).filter(({ column }) => column >= 0 && Number.isFinite(coefficients[column]!));
  const m = usable.length;
  if (m === 0) return null;
  const covariance = new Float64Array(m * m);
  usable.forEach((a, r) => usable.forEach((b, c) => (covariance[r * m + c] = covarianceOf(a.column, b.column))));
  return manyToControl(usable.map((u) => u.treatment), usable.map((u) => coefficients[u.column]!), covariance, df, alpha);
}
