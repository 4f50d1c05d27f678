import { chiSquareUpperTail } from './chi-square';
import type { LayoutTerm, ModelLayout } from './model-layout';

/** One likelihood-ratio test of a term: the model without it against the full model. */
export interface LikelihoodRatioRow {
  readonly term: string;
  readonly df: number;
  readonly chiSquare: number;
  /** Null when the term has no degrees of freedom left (aliased with the others). */
  readonly p: number | null;
}

/** What a refit reports: its maximized log-likelihood and the number of estimated coefficients. */
export interface RefitSummary {
  readonly logLik: number;
  readonly rank: number;
}

/**
 * The terms a model of the layout holds, and which to leave out for each term's test: each term alone, as
 * R's `drop1(fit, test = "Chisq")`, except a site, which goes together with its blocks (blocks are nested in
 * sites, so dropping a site alone would change nothing).
 */
export function layoutTermTests(layout: ModelLayout): { all: LayoutTerm[]; tests: { term: string; without: LayoutTerm[] }[] } {
  const all = [...layout.blockingTerms, layout.treatmentTerm];
  const tests = all.map((term) => ({
    term: term.name,
    without: all.filter((t) => t !== term && !(term.name === 'site' && t.name === 'block:site')),
  }));
  return { all, tests };
}

/**
 * Likelihood-ratio tests of each term by refitting without it: χ² = 2 (ℓ_full − ℓ_reduced) on the
 * difference in estimated coefficients (R's `drop1(fit, test = "Chisq")` and `anova(reduced, full)`).
 * Reference: Wilks (1938), Ann. Math. Statist. 9:60; McCullagh & Nelder (1989), Generalized Linear Models,
 * 2nd ed., §4.4.
 * @throws whatever the refit throws.
 * @example dropTermTests(layout, full, (terms) => refit(terms)); // [{ term: 'block', df: 3, chiSquare: …, p: … }, …]
 */
export function dropTermTests(layout: ModelLayout, full: RefitSummary, refit: (terms: LayoutTerm[]) => RefitSummary): LikelihoodRatioRow[] {
  return layoutTermTests(layout).tests.map(({ term, without }) => {
    const reduced = refit(without);
    const df = full.rank - reduced.rank;
    const chiSquare = Math.max(0, 2 * (full.logLik - reduced.logLik));
    return Object.freeze({ term, df, chiSquare, p: df > 0 ? chiSquareUpperTail(chiSquare, df) : null });
  });
}
