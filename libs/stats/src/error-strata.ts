/** One error stratum of a balanced design: its mean square and degrees of freedom. */
export interface ErrorStratum {
  /** 'plot', 'whole plot', 'sub plot', 'sub-sub plot'. */
  readonly stratum: string;
  /** The ANOVA row that is this stratum's error, e.g. 'block:Amendment' or 'error'. */
  readonly errorTerm: string;
  readonly ms: number;
  readonly df: number;
}

/** The variance of a linear function of the observations, as a weighted sum of stratum mean squares. */
export interface StratumVariance {
  readonly variance: number;
  /** a_k of Var = Σ a_k E_k, one per stratum (whole plot first). */
  readonly coefficients: readonly number[];
  /** Satterthwaite's degrees of freedom of Σ a_k E_k. */
  readonly df: number;
}

/**
 * Stratum variances: for a balanced nested block structure (blocks ⊃ whole plots ⊃ sub plots ⊃ plots) the
 * covariance of two linear functions c₁'y and c₂'y is Σ_k E_k (⟨Ā_k c₁, Ā_k c₂⟩ − ⟨Ā_{k−1} c₁, Ā_{k−1} c₂⟩), where
 * Ā_k averages over the units of stratum k and E_k is the stratum's error mean square; the block stratum (and
 * the mean) is charged to the top error stratum, so a mean's standard error is the textbook one (√(Ea/rb) for a
 * whole-plot mean). Differences of treatment means need no block term. For a split plot this gives the four
 * standard errors of a difference: 2Ea/rb, 2Eb/ra, 2Eb/r and 2[(b−1)Eb + Ea]/rb.
 * Degrees of freedom: Satterthwaite (1946) for Σ a_k E_k; the weighted t of Cochran & Cox is `weightedCritical`.
 * Reference: Gomez & Gomez (1984), Statistical Procedures for Agricultural Research, 2nd ed., §3.4.2 and §4.4
 * (standard errors of mean differences in split and split-split plots); Nelder (1965), Proc. R. Soc. A 283:147.
 * @throws never.
 * @example const strata = errorStrata([wholePlotCodes, plotCodes], [Ea, Eb]); strata.variance(c).variance;
 */
export function errorStrata(units: readonly Int32Array[], strata: readonly ErrorStratum[]): {
  variance(first: Float64Array, second?: Float64Array): StratumVariance;
  weightedCritical(variance: StratumVariance, critical: (df: number) => number): number;
} {
  const unitCounts = units.map((codes) => {
    let max = 0;
    for (const code of codes) max = Math.max(max, code + 1);
    const counts = new Float64Array(max);
    for (const code of codes) counts[code]!++;
    return counts;
  });
  // A stratum of single plots (the last) needs no unit sums: Ā is the identity there.
  const single = units.map((codes, k) => unitCounts[k]!.length === codes.length && codes.every((code, i) => code === i));
  // Unit sums of each linear function, per stratum, kept while the function is alive: the covariances of k
  // means cost O(units) per pair instead of O(n) and an allocation.
  const sumsOf = units.map(() => new WeakMap<Float64Array, Float64Array>());
  const unitSums = (k: number, contrast: Float64Array): Float64Array => {
    if (single[k]) return contrast;
    let sums = sumsOf[k]!.get(contrast);
    if (!sums) {
      const codes = units[k]!;
      sums = new Float64Array(unitCounts[k]!.length);
      for (let i = 0; i < codes.length; i++) sums[codes[i]!]! += contrast[i]!;
      sumsOf[k]!.set(contrast, sums);
    }
    return sums;
  };
  const innerAt = (k: number, first: Float64Array, second: Float64Array): number => {
    const counts = unitCounts[k]!;
    const sumsFirst = unitSums(k, first);
    const sumsSecond = first === second ? sumsFirst : unitSums(k, second);
    // Σ_i Ā c₁(i) Ā c₂(i) = Σ_units (sum₁ · sum₂) / count.
    let inner = 0;
    for (let u = 0; u < counts.length; u++) if (counts[u]! > 0) inner += (sumsFirst[u]! * sumsSecond[u]!) / counts[u]!;
    return inner;
  };
  return {
    variance(first: Float64Array, second: Float64Array = first): StratumVariance {
      const inners = units.map((_, k) => innerAt(k, first, second));
      const coefficients = inners.map((inner, k) => (k === 0 ? inner : inner - inners[k - 1]!));
      let variance = 0;
      let denominator = 0;
      coefficients.forEach((a, k) => {
        const part = a * strata[k]!.ms;
        variance += part;
        if (strata[k]!.df > 0 && Math.abs(a) > 1e-14) denominator += (part * part) / strata[k]!.df;
      });
      // One stratum alone: its own degrees of freedom exactly (Satterthwaite's ratio would carry rounding).
      const used = coefficients.map((a, k) => (Math.abs(a) > 1e-14 ? k : -1)).filter((k) => k >= 0);
      const df = used.length === 1 ? strata[used[0]!]!.df : denominator > 0 ? (variance * variance) / denominator : strata[strata.length - 1]!.df;
      return Object.freeze({ variance, coefficients: Object.freeze(coefficients), df });
    },
    weightedCritical(variance: StratumVariance, critical: (df: number) => number): number {
      let weighted = 0;
      let total = 0;
      variance.coefficients.forEach((a, k) => {
        if (Math.abs(a) <= 1e-14) return;
        const part = a * strata[k]!.ms;
        weighted += part * critical(strata[k]!.df);
        total += part;
      });
      return total > 0 ? weighted / total : critical(variance.df);
    },
  };
}
