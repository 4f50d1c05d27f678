import { invalidInput } from './checks';

/**
 * The designs Friable lays out. One treatment factor: completely randomized (`crd`) or in complete
 * blocks (`rcbd`). Factorials of 2–4 crossed factors, completely randomized or in blocks. Split plot
 * (whole-plot factor, sub-plot factor) and split-split plot (whole-plot, sub-plot and sub-sub-plot
 * factors), always in blocks.
 */
export const TRIAL_DESIGNS = Object.freeze(['crd', 'rcbd', 'factorial-crd', 'factorial-rcbd', 'split-plot', 'split-split-plot'] as const);
export type TrialDesign = (typeof TRIAL_DESIGNS)[number];

/** The unit a factor's level is applied to: the plot (one-factor designs and factorials), or a stratum of a split plot. */
export type AppliedUnit = 'plot' | 'whole plot' | 'sub plot' | 'sub-sub plot';

export interface DesignRule {
  /** Plots are grouped in complete blocks (every treatment once per block). */
  readonly blocked: boolean;
  /** Fewest and most factors; 0 for a one-factor design, whose treatments are entered one by one. */
  readonly minFactors: number;
  readonly maxFactors: number;
  /** Split designs: the factors in order from the whole plot down. */
  readonly split: boolean;
  /** How people read it. */
  readonly name: string;
}

/** What each design needs; the API, the Protocol page and the randomization read it from here. */
export const DESIGN_RULES: Readonly<Record<TrialDesign, DesignRule>> = Object.freeze({
  crd: Object.freeze({ blocked: false, minFactors: 0, maxFactors: 0, split: false, name: 'completely randomized' }),
  rcbd: Object.freeze({ blocked: true, minFactors: 0, maxFactors: 0, split: false, name: 'randomized complete blocks' }),
  'factorial-crd': Object.freeze({ blocked: false, minFactors: 2, maxFactors: 4, split: false, name: 'factorial, completely randomized' }),
  'factorial-rcbd': Object.freeze({ blocked: true, minFactors: 2, maxFactors: 4, split: false, name: 'factorial in randomized complete blocks' }),
  'split-plot': Object.freeze({ blocked: true, minFactors: 2, maxFactors: 2, split: true, name: 'split plot in blocks' }),
  'split-split-plot': Object.freeze({ blocked: true, minFactors: 3, maxFactors: 3, split: true, name: 'split-split plot in blocks' }),
});

/** Throws the shared RangeError when `design` is not one of `TRIAL_DESIGNS`. */
export function requireTrialDesign(functionName: string, design: unknown): TrialDesign {
  if (!TRIAL_DESIGNS.includes(design as TrialDesign)) {
    throw invalidInput(functionName, 'design', `one of ${TRIAL_DESIGNS.map((d) => `"${d}"`).join(', ')}`, design);
  }
  return design as TrialDesign;
}

/** Throws the shared RangeError unless `factors` is a list of as many factors as the design takes; returns it. */
export function requireFactorCount<F>(functionName: string, design: TrialDesign, factors: readonly F[] | undefined): readonly F[] {
  const rule = DESIGN_RULES[design];
  if (!Array.isArray(factors) || factors.length < rule.minFactors || factors.length > rule.maxFactors) {
    const count = rule.minFactors === rule.maxFactors ? `exactly ${rule.minFactors}` : `${rule.minFactors} to ${rule.maxFactors}`;
    throw invalidInput(functionName, 'factors', `a list of ${count} factors for a ${rule.name} design`, factors);
  }
  return factors;
}

/** True for the designs whose treatments are combinations of factor levels. */
export function isFactorDesign(design: TrialDesign): boolean {
  return DESIGN_RULES[design].maxFactors > 0;
}

const SPLIT_UNITS: readonly AppliedUnit[] = ['whole plot', 'sub plot', 'sub-sub plot'];

/**
 * Applied unit — the unit a factor's levels are applied to.
 *
 * Purpose: a split plot's whole-plot factor goes on whole plots (all the sub plots of one whole
 * plot get the same level), its sub-plot factor on sub plots; every other design applies every
 * factor to the plot. The Rate calculator scales a rate by the area of this unit.
 * Reference: Gomez & Gomez (1984), Statistical Procedures for Agricultural Research, 2nd ed., ch. 3.4–3.5.
 * Throws: RangeError for an unknown design or a position outside the design's factors.
 * Example: `appliedUnit('split-plot', 0)` → 'whole plot'; `appliedUnit('factorial-rcbd', 2)` → 'plot'
 */
export function appliedUnit(design: TrialDesign, factorIndex: number): AppliedUnit {
  const rule = DESIGN_RULES[requireTrialDesign('appliedUnit', design)];
  const most = Math.max(rule.maxFactors, 1);
  if (!Number.isInteger(factorIndex) || factorIndex < 0 || factorIndex >= most) {
    throw invalidInput('appliedUnit', 'factorIndex', `a whole number from 0 to ${most - 1}`, factorIndex);
  }
  return rule.split ? SPLIT_UNITS[factorIndex]! : 'plot';
}

/**
 * Plots per applied unit — how many measured plots one unit of a factor covers.
 *
 * Purpose: a whole plot of a split plot holds one sub plot per sub-plot level (times the
 * sub-sub-plot levels in a split-split plot), so a whole-plot amendment is weighed out for that
 * many plots' surface. Plots of a factorial are their own unit (1).
 * Reference: the layout of `randomizeSite` (sub plots side by side inside their whole plot).
 * Throws: RangeError for an unknown design, a position outside its factors, or level counts that
 * are not whole numbers of at least 1.
 * Example: `plotsPerAppliedUnit('split-split-plot', [3, 4, 2], 0)` → 8 (4 sub plots × 2 sub-sub plots)
 */
export function plotsPerAppliedUnit(design: TrialDesign, levelCounts: readonly number[], factorIndex: number): number {
  const unit = appliedUnit(design, factorIndex);
  if (unit === 'plot') return 1;
  for (const [index, count] of levelCounts.entries()) {
    if (!Number.isInteger(count) || count < 1) throw invalidInput('plotsPerAppliedUnit', `levelCounts[${index}]`, 'a whole number of at least 1', count);
  }
  return levelCounts.slice(factorIndex + 1).reduce((product, count) => product * count, 1);
}
