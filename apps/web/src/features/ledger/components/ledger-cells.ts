import type { Measure, Observation, Plot } from '@friable/contracts';

/** The key of one cell of the Ledger: a plot and a measure (the round is the page's). */
export const cellKey = (plotId: number, measureId: number) => `${plotId}:${measureId}`;

/** The Ledger's rows (plots in block and position order) and a lookup of the stored values. */
export function ledgerModel(plots: Plot[], observations: Observation[], measures: Measure[]) {
  const rows = [...plots].sort((a, b) => a.block - b.block || a.position - b.position);
  const values = new Map(observations.map((o) => [cellKey(o.plotId, o.measureId), o]));
  const columns = [...measures].sort((a, b) => a.position - b.position);
  return { rows, columns, values };
}
