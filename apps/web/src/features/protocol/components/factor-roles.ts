import type { AppliedUnit, Factor, TrialDesign, TrialDetail } from '@friable/contracts';
import { DESIGN_RULES, plotsPerAppliedUnit } from '@friable/field';

const SPLIT_ROLES = ['Whole-plot factor', 'Sub-plot factor', 'Sub-sub-plot factor'];

/** How the Protocol names a factor by its place: "Factor A" in a factorial, "Whole-plot factor" in a split plot. */
export function factorRole(design: TrialDesign, index: number): string {
  return DESIGN_RULES[design].split ? (SPLIT_ROLES[index] ?? `Factor ${index + 1}`) : `Factor ${String.fromCharCode(65 + index)}`;
}

/** "on every plot", "on whole plots": where a factor's levels go, in words. */
export function appliedToWords(unit: AppliedUnit): string {
  return unit === 'plot' ? 'on every plot' : `on ${unit}s`;
}

/** The factors in their order (a split plot's whole-plot factor first). */
export function orderedFactors(factors: readonly Factor[]): Factor[] {
  return [...factors].sort((a, b) => a.position - b.position);
}

/** A split plot's plots per whole plot (its sub plots, times their sub-sub plots); null for other designs or before the factors are named. */
export function plotsPerWholePlot(trial: Pick<TrialDetail, 'design' | 'factors'>): number | null {
  const factors = orderedFactors(trial.factors);
  if (!DESIGN_RULES[trial.design].split || factors.length < DESIGN_RULES[trial.design].minFactors) return null;
  return plotsPerAppliedUnit(trial.design, factors.map((f) => f.levels.length), 0);
}
