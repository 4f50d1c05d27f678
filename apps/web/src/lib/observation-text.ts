import type { Observation } from '@friable/contracts';

export type CellLook = 'empty' | 'measured' | 'censored' | 'missing';

/** How a stored value looks: measured, censored (not reached by the cut-off), missing (NA), or no value yet. */
export function cellLook(observation: Observation | undefined): CellLook {
  if (!observation) return 'empty';
  if (observation.censored) return 'censored';
  if (observation.valueText === null) return 'missing';
  return 'measured';
}

/** The text a person edits and reads: "412", ">600" for a censored value, "NA" for a missing one. */
export function cellText(observation: Observation | undefined): string {
  switch (cellLook(observation)) {
    case 'empty':
      return '';
    case 'censored':
      return `>${observation!.valueText}`;
    case 'missing':
      return 'NA';
    default:
      return observation!.valueText ?? '';
  }
}
