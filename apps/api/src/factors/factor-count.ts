import type { TrialDesign } from '@friable/contracts';
import { DESIGN_RULES } from '@friable/field';

const SPLIT_ORDER = ['the whole-plot factor', 'the sub-plot factor', 'the sub-sub-plot factor'];

/** The factor count a design takes, in words, when `count` is not it; null when it is. */
export function factorCountProblem(design: TrialDesign, count: number): string | null {
  const rule = DESIGN_RULES[design];
  if (count >= rule.minFactors && count <= rule.maxFactors) return null;
  if (rule.split) {
    return `A ${rule.name} takes exactly ${rule.minFactors} factors, in this order: ${SPLIT_ORDER.slice(0, rule.minFactors).join(', then ')}; ${count} ${count === 1 ? 'was' : 'were'} given.`;
  }
  return `A ${rule.name} design takes ${rule.minFactors} to ${rule.maxFactors} factors; ${count} ${count === 1 ? 'was' : 'were'} given.`;
}
