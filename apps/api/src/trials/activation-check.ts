import type { ActivationCheck, AssessmentRound, Measure, Site, Treatment } from '@friable/contracts';

export interface ActivationInput {
  design: 'crd' | 'rcbd' | 'factorial-rcbd';
  factorCount: number;
  noControlReason: string | null;
  treatments: Pick<Treatment, 'isControl'>[];
  measures: Pick<Measure, 'id'>[];
  rounds: Pick<AssessmentRound, 'label' | 'measureIds'>[];
  sites: Pick<Site, 'name' | 'plotCount'>[];
}

/**
 * Activation check — what still stops a draft trial from becoming active, in words.
 * Needs: two treatments or more, a control (or a stated reason for none), a measure, a round
 * (each with a measure), a site, and every site randomized.
 * Throws: nothing. Example: a trial with one treatment gives
 * `{ ready: false, problems: ['The trial needs at least two treatments; it has 1.', …] }`.
 */
export function activationCheck(input: ActivationInput): ActivationCheck {
  const problems: string[] = [];
  if (input.design === 'factorial-rcbd' && input.factorCount !== 2) problems.push('A factorial trial needs its two factors with their levels.');
  if (input.treatments.length < 2) problems.push(`The trial needs at least two treatments; it has ${input.treatments.length}.`);
  if (!input.treatments.some((t) => t.isControl) && !input.noControlReason?.trim()) {
    problems.push('No treatment is marked as the control; mark one, or give the reason the trial has none.');
  }
  if (input.measures.length === 0) problems.push('The trial needs at least one measure.');
  if (input.rounds.length === 0) problems.push('The trial needs at least one assessment round.');
  for (const round of input.rounds) if (round.measureIds.length === 0) problems.push(`Round ${round.label} takes no measures.`);
  if (input.sites.length === 0) problems.push('The trial needs at least one site.');
  for (const site of input.sites) if (site.plotCount === 0) problems.push(`Site ${site.name} is not randomized yet.`);
  return { ready: problems.length === 0, problems };
}
