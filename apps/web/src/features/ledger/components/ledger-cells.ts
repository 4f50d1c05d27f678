import type { Measure, Observation, Plot } from '@friable/contracts';

/** The key of one cell of the Ledger: a plot and a measure (the round is the page's). */
export const cellKey = (plotId: number, measureId: number) => `${plotId}:${measureId}`;

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

/** The Ledger's rows (plots in block and position order) and a lookup of the stored values. */
export function ledgerModel(plots: Plot[], observations: Observation[], measures: Measure[]) {
  const rows = [...plots].sort((a, b) => a.block - b.block || a.position - b.position);
  const values = new Map(observations.map((o) => [cellKey(o.plotId, o.measureId), o]));
  const columns = [...measures].sort((a, b) => a.position - b.position);
  return { rows, columns, values };
}
