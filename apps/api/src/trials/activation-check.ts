import type { ActivationCheck, AssessmentRound, Measure, Site, Treatment, TrialDesign } from '@friable/contracts';
import { DESIGN_RULES } from '@friable/field';
import { factorCountProblem } from '../factors/factor-count';

export interface ActivationInput {
  design: TrialDesign;
  factorCount: number;
  noControlReason: string | null;
  treatments: Pick<Treatment, 'isControl'>[];
  measures: Pick<Measure, 'id'>[];
  rounds: Pick<AssessmentRound, 'label' | 'measureIds'>[];
  sites: Pick<Site, 'name' | 'plotCount' | 'warnings'>[];
}

/**
 * Activation check — what still stops a draft trial from becoming active, in words, and what should be read
 * before it starts.
 * Needs: the factors the design takes (factorial 2–4, split plot 2, split-split plot 3), two treatments or more,
 * a control (or a stated reason for none), a measure, a round (each with a measure), a site, and every site
 * randomized. Warnings (not blocking): each site's design guardrails, e.g. a split plot's whole-plot error with
 * 1 degree of freedom, prefixed with the site's name.
 * Throws: nothing. Example: a trial with one treatment gives
 * `{ ready: false, problems: ['The trial needs at least two treatments; it has 1.', …], warnings: [] }`.
 */
export function activationCheck(input: ActivationInput): ActivationCheck {
  const problems: string[] = [];
  if (DESIGN_RULES[input.design].maxFactors > 0) {
    if (input.factorCount === 0) problems.push(`The ${DESIGN_RULES[input.design].name} design needs its factors with their levels.`);
    else {
      const countProblem = factorCountProblem(input.design, input.factorCount);
      if (countProblem) problems.push(`${countProblem} Change the factors or the design.`);
    }
  }
  if (input.treatments.length < 2) problems.push(`The trial needs at least two treatments; it has ${input.treatments.length}.`);
  if (!input.treatments.some((t) => t.isControl) && !input.noControlReason?.trim()) {
    problems.push('No treatment is marked as the control; mark one, or give the reason the trial has none.');
  }
  if (input.measures.length === 0) problems.push('The trial needs at least one measure.');
  if (input.rounds.length === 0) problems.push('The trial needs at least one assessment round.');
  for (const round of input.rounds) if (round.measureIds.length === 0) problems.push(`Round ${round.label} takes no measures.`);
  if (input.sites.length === 0) problems.push('The trial needs at least one site.');
  for (const site of input.sites) if (site.plotCount === 0) problems.push(`Site ${site.name} is not randomized yet.`);
  const warnings = input.sites.flatMap((site) => site.warnings.map((warning) => `${site.name}: ${warning}`));
  return { ready: problems.length === 0, problems, warnings };
}
