import type { AnalysisDesign, TrialDesign } from '@friable/contracts';
import { DESIGN_RULES } from '@friable/field';

/** The engine's design for a trial's data, or the sentence that says why it cannot be analysed so. */
export type AnalysisChoice = { design: AnalysisDesign; withFactors: boolean } | { refusal: string };

const COMBINED: Partial<Record<TrialDesign, AnalysisDesign>> = {
  rcbd: 'multisite-rcbd',
  'factorial-rcbd': 'multisite-factorial-rcbd',
  'split-plot': 'multisite-split-plot',
};

/**
 * Analysis design — which of the engine's designs analyses a trial's data at one site or several combined.
 * A factorial or split-plot trial is analysed on its factors once they fit its design (its treatments are the level
 * combinations); until then as a one-factor design on the combinations. Sites combine only for blocked designs, and
 * for the split-split plot not at all (the engine has no combined split-split model): each says so in a sentence.
 * Throws: nothing.
 * Example: `analysisDesign('split-plot', 2, 2)` → { design: 'multisite-split-plot', withFactors: true }
 */
export function analysisDesign(trialDesign: TrialDesign, siteCount: number, factorCount: number): AnalysisChoice {
  const rule = DESIGN_RULES[trialDesign];
  const factorsFit = rule.maxFactors > 0 && factorCount >= rule.minFactors && factorCount <= rule.maxFactors;
  const design: TrialDesign = factorsFit ? trialDesign : rule.blocked ? 'rcbd' : 'crd';
  if (siteCount <= 1) return { design, withFactors: factorsFit };
  if (!rule.blocked) return { refusal: 'Sites can be combined only for blocked designs; choose one site for a completely randomized trial.' };
  const combined = COMBINED[design];
  if (!combined) return { refusal: 'Sites cannot be combined for a split-split plot; choose one site, and compare the sites side by side.' };
  return { design: combined, withFactors: factorsFit };
}
