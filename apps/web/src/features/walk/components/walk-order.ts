import type { AssessmentRound, Plot } from '@friable/contracts';

/** The walk's order: block by block, and within a block in the plot plan's order. */
export function walkOrder(plots: readonly Plot[]): Plot[] {
  return [...plots].sort((a, b) => a.block - b.block || a.position - b.position);
}

/** The round before this one (by day) that assessed the measure, whose value the walk shows for comparison. */
export function previousRoundFor(rounds: readonly AssessmentRound[], round: AssessmentRound, measureId: number): AssessmentRound | undefined {
  return [...rounds]
    .filter((r) => r.dayOffset < round.dayOffset && r.measureIds.includes(measureId))
    .sort((a, b) => b.dayOffset - a.dayOffset)[0];
}

/** The plot to open: the one in the address, else the first. Returns its index in the walk. */
export function startIndex(ordered: readonly Plot[], plotParam: string | null): number {
  const found = plotParam ? ordered.findIndex((p) => p.id === Number(plotParam) || p.label === plotParam) : -1;
  return found >= 0 ? found : 0;
}
