import { jStat } from 'jstat';
import { StatsInputError } from './errors';

/** One plot's time: the time it drained (an event) or, when censored, the time it was last seen undrained. */
export interface TimedValue {
  readonly time: number;
  /** True when the plot had not drained by `time` (right-censored). */
  readonly censored: boolean;
}

/** One step of a product-limit curve, at a distinct time holding an event or a censoring. */
export interface ProductLimitPoint {
  readonly time: number;
  /** Share still not drained just after `time`: S(t). */
  readonly notDrained: number;
  /** Pointwise confidence limits of S(t) (log transform, as R's survfit default); null once S(t) = 0. */
  readonly lower: number | null;
  readonly upper: number | null;
  /** Plots still undrained just before `time`. */
  readonly atRisk: number;
  readonly events: number;
  readonly censored: number;
}

/** A median (or other quantile) with its interval; null where the curve never falls that far ("not reached"). */
export interface CurveMedian {
  readonly median: number | null;
  readonly lower: number | null;
  readonly upper: number | null;
}

export interface ProductLimitCurve {
  readonly plots: number;
  readonly events: number;
  /** Starts at {time: 0, notDrained: 1}; then one point per distinct time (events and censorings), as survfit. */
  readonly points: readonly ProductLimitPoint[];
  readonly median: CurveMedian;
}

const QUANTILE_TOLERANCE = Math.sqrt(Number.EPSILON); // as survival's quantile.survfit

/**
 * The time at which a step curve 1 − S(t) first reaches p, with survival's rule for a curve that sits
 * exactly at p over an interval (the midpoint of that interval, and of the last time and the end of
 * follow-up when it sits at p to the end). Null when the curve never reaches p.
 */
function quantileOfCurve(times: readonly number[], notDrained: readonly (number | null)[], p: number, lastTime: number): number | null {
  // Work on 1 − S, dropping repeated values as findq() does (the first time of each value is kept).
  const x: number[] = [];
  const y: (number | null)[] = [];
  const seen = new Set<number | null>();
  notDrained.forEach((s, i) => {
    const value = s === null ? null : 1 - s;
    if (seen.has(value)) return;
    seen.add(value);
    x.push(times[i]!);
    y.push(value);
  });
  const known = y.flatMap((value, i) => (value === null ? [] : [{ value, i }]));
  if (known.length === 0 || Math.max(...known.map((k) => k.value)) < p) return null;
  // approx(y ± tol, 1:n, p, method = "constant", f = 1): the index of the smallest shifted y that is ≥ p.
  const sorted = [...known].sort((a, b) => a.value - b.value);
  const firstAtLeast = (shift: number): number | null => sorted.find((k) => k.value + shift >= p)?.i ?? null;
  const i1 = firstAtLeast(QUANTILE_TOLERANCE);
  const i2 = firstAtLeast(-QUANTILE_TOLERANCE);
  const last = y[y.length - 1];
  if (last !== null && last !== undefined && Math.abs(p - last) < QUANTILE_TOLERANCE && i1 !== null) return (x[i1]! + lastTime) / 2;
  if (i1 === null || i2 === null) return null;
  return (x[i1]! + x[i2]!) / 2;
}

/**
 * Product-limit (Kaplan–Meier) curve of the share of plots not yet drained, with Greenwood's variance and
 * pointwise 95 % limits on the log scale, S·exp(±z·se(log S)) capped at 1, and the median drain time with
 * its interval read off the curve and its limits ("not reached" = null). Equals R's
 * `survfit(Surv(time, drained) ~ 1, conf.type = "log")` and `quantile(fit, 0.5)`.
 * Reference: Kaplan & Meier (1958), JASA 53:457; Greenwood (1926); Brookmeyer & Crowley (1982),
 * Biometrics 38:29 (the median's interval); Therneau, survival package (survfit, quantile.survfit).
 * @throws StatsInputError for no values, or a time that is not a finite number of at least 0.
 * @example productLimitCurve([{ time: 10, censored: false }, { time: 600, censored: true }]).points[1];
 *   // { time: 10, notDrained: 0.5, lower: 0.125, upper: 1, atRisk: 2, events: 1, censored: 0 }
 */
export function productLimitCurve(values: readonly TimedValue[], confidence = 0.95): ProductLimitCurve {
  if (values.length === 0) throw new StatsInputError('too few observations', 'a product-limit curve needs at least one plot');
  values.forEach((value, i) => {
    if (!Number.isFinite(value.time) || value.time < 0) throw new StatsInputError('invalid time', `time of plot ${i + 1} must be a finite number of at least 0, got ${value.time}`);
  });
  const z = jStat.normal.inv(1 - (1 - confidence) / 2, 0, 1);
  const sorted = [...values].sort((a, b) => a.time - b.time);
  const points: ProductLimitPoint[] = [{ time: 0, notDrained: 1, lower: 1, upper: 1, atRisk: values.length, events: 0, censored: 0 }];
  let atRisk = values.length;
  let survival = 1;
  let greenwood = 0;
  let events = 0;
  for (let i = 0; i < sorted.length; ) {
    const time = sorted[i]!.time;
    let drained = 0;
    let stillWet = 0;
    while (i < sorted.length && sorted[i]!.time === time) {
      if (sorted[i]!.censored) stillWet++;
      else drained++;
      i++;
    }
    if (drained > 0) {
      survival *= 1 - drained / atRisk;
      greenwood += drained < atRisk ? drained / (atRisk * (atRisk - drained)) : Number.POSITIVE_INFINITY;
      events += drained;
    }
    const se = Math.sqrt(greenwood);
    const limits =
      survival > 0 && Number.isFinite(se) ? { lower: survival * Math.exp(-z * se), upper: Math.min(1, survival * Math.exp(z * se)) } : { lower: null, upper: null };
    if (time === 0 && points.length === 1) points.pop();
    points.push({ time, notDrained: survival, ...limits, atRisk, events: drained, censored: stillWet });
    atRisk -= drained + stillWet;
  }
  const curveTimes = points.map((p) => p.time);
  const lastTime = sorted[sorted.length - 1]!.time;
  const median: CurveMedian = {
    median: quantileOfCurve(curveTimes, points.map((p) => p.notDrained), 0.5, lastTime),
    // The lower curve falls to one half first: it gives the median's lower limit, the upper curve its upper one.
    lower: quantileOfCurve(curveTimes, points.map((p) => p.lower), 0.5, lastTime),
    upper: quantileOfCurve(curveTimes, points.map((p) => p.upper), 0.5, lastTime),
  };
  return Object.freeze({ plots: values.length, events, points: Object.freeze(points.map((p) => Object.freeze(p))), median: Object.freeze(median) });
}
