import type { TrialStatus } from '@friable/contracts';

/** Moves a trial may make; `→ active` from draft also needs the activation checks to pass. */
const ALLOWED: Record<TrialStatus, TrialStatus[]> = {
  draft: ['active'],
  active: ['draft', 'locked'],
  locked: ['active', 'archived'],
  archived: [],
};

/**
 * Status transition refusal — why a trial may not move from one status to another, or null.
 * active → draft is allowed only while no site holds observations.
 * Throws: nothing. Example: `statusTransitionRefusal('draft', 'locked', false)` →
 * 'A draft trial can become active only; it cannot become locked.'
 */
export function statusTransitionRefusal(from: TrialStatus, to: TrialStatus, hasObservations: boolean): string | null {
  if (from === to) return null;
  if (!ALLOWED[from].includes(to)) {
    return ALLOWED[from].length
      ? `${from === 'active' ? 'An' : 'A'} ${from} trial can become ${ALLOWED[from].join(' or ')} only; it cannot become ${to}.`
      : `An ${from} trial cannot change status.`;
  }
  if (from === 'active' && to === 'draft' && hasObservations) {
    return 'This trial already holds observations, so it cannot go back to draft; lock it instead.';
  }
  return null;
}
