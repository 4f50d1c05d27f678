import { chiSquareUpperTail } from './chi-square';
import { StatsInputError } from './errors';
import { factorSymmetric } from './symmetric-factor';

/** A plot's time, its group (treatment) and its stratum (block, or site × block). */
export interface StratifiedTime {
  readonly time: number;
  readonly censored: boolean;
  readonly group: string;
  readonly stratum?: string;
}

export interface LogRankResult {
  readonly chiSquare: number;
  readonly df: number;
  readonly p: number;
  /** Number of strata the test was summed over (1 when not stratified). */
  readonly strata: number;
  /** Per group, in order of first appearance: observed and expected events. */
  readonly groups: readonly { readonly group: string; readonly observed: number; readonly expected: number }[];
}

/**
 * Log-rank test of equal drain-time curves across groups, stratified: within each stratum, at each
 * distinct event time, the events of each group are compared with those expected from its share of the
 * plots still at risk (hypergeometric variance); observed − expected and the variance matrix are summed
 * over strata, and χ² = (O − E)' V⁻ (O − E) on (groups with E > 0) − 1 degrees of freedom, leaving out the
 * first such group, as R's `survdiff(Surv(time, drained) ~ group + strata(stratum))`.
 * Reference: Mantel (1966), Cancer Chemother. Rep. 50:163; Peto & Peto (1972), JRSS A 135:185;
 * Kalbfleisch & Prentice (2002), The Statistical Analysis of Failure Time Data, 2nd ed., §7.2.
 * @throws StatsInputError for fewer than two groups or a time that is not a finite number of at least 0.
 * @example logRank([{ time: 5, censored: false, group: 'a' }, { time: 9, censored: false, group: 'b' }]).chiSquare; // 1
 */
export function logRank(values: readonly StratifiedTime[]): LogRankResult {
  const groups = [...new Set(values.map((v) => v.group))];
  if (groups.length < 2) throw new StatsInputError('too few treatments', `a log-rank test needs at least two treatments, found ${groups.length}`);
  values.forEach((v, i) => {
    if (!Number.isFinite(v.time) || v.time < 0) throw new StatsInputError('invalid time', `time of plot ${i + 1} must be a finite number of at least 0, got ${v.time}`);
  });
  const k = groups.length;
  const groupIndex = new Map(groups.map((g, i) => [g, i]));
  const groupOf = Int32Array.from(values, (v) => groupIndex.get(v.group)!);
  const strataIndex = new Map<string, number>();
  const stratumOf = Int32Array.from(values, (v) => {
    const key = v.stratum ?? '';
    let code = strataIndex.get(key);
    if (code === undefined) strataIndex.set(key, (code = strataIndex.size));
    return code;
  });
  // One pass over the plots sorted by stratum, then time.
  const order = Int32Array.from(values, (_, i) => i).sort((a, b) => stratumOf[a]! - stratumOf[b]! || values[a]!.time - values[b]!.time);
  const observed = new Float64Array(k);
  const expected = new Float64Array(k);
  const variance = new Float64Array(k * k);
  const atRisk = new Float64Array(k);
  const drained = new Float64Array(k);
  const leaving = new Float64Array(k);
  for (let start = 0; start < order.length; ) {
    const stratum = stratumOf[order[start]!]!;
    let end = start;
    atRisk.fill(0);
    while (end < order.length && stratumOf[order[end]!] === stratum) atRisk[groupOf[order[end++]!]!]!++;
    let total = end - start;
    for (let i = start; i < end; ) {
      const time = values[order[i]!]!.time;
      drained.fill(0);
      leaving.fill(0);
      let events = 0;
      let leavingTotal = 0;
      for (; i < end && values[order[i]!]!.time === time; i++) {
        const plot = order[i]!;
        const g = groupOf[plot]!;
        if (!values[plot]!.censored) {
          drained[g]!++;
          events++;
        }
        leaving[g]!++;
        leavingTotal++;
      }
      if (events > 0) {
        const spread = total > 1 ? (events * (total - events)) / (total * total * (total - 1)) : 0;
        for (let a = 0; a < k; a++) {
          const nA = atRisk[a]!;
          observed[a]! += drained[a]!;
          expected[a]! += (events * nA) / total;
          if (spread === 0 || nA === 0) continue;
          const row = a * k;
          variance[row + a]! += spread * nA * total;
          for (let b = 0; b < k; b++) variance[row + b]! -= spread * nA * atRisk[b]!;
        }
      }
      for (let a = 0; a < k; a++) atRisk[a]! -= leaving[a]!;
      total -= leavingTotal;
    }
    start = end;
  }
  const used = groups.map((_, a) => a).filter((a) => expected[a]! > 0);
  let chiSquare = 0;
  if (used.length >= 2) {
    const kept = used.slice(1);
    const m = kept.length;
    const sub = new Float64Array(m * m);
    const difference = new Float64Array(m);
    kept.forEach((a, r) => {
      difference[r] = observed[a]! - expected[a]!;
      kept.forEach((b, c) => (sub[r * m + c] = variance[a * k + b]!));
    });
    const solution = factorSymmetric(sub, m, 1e-10).solve(difference);
    for (let r = 0; r < m; r++) chiSquare += solution[r]! * difference[r]!;
  }
  const df = used.length - 1;
  return Object.freeze({
    chiSquare,
    df,
    p: df > 0 ? chiSquareUpperTail(chiSquare, df) : 1,
    strata: strataIndex.size,
    groups: Object.freeze(groups.map((group, a) => Object.freeze({ group, observed: observed[a]!, expected: expected[a]! }))),
  });
}
