import type { Findings, FindingsAnswer } from '@friable/contracts';
import { contextPlots } from './context-plots';
import { FindingsView } from './findings-view';
import { inProtocolOrder } from './stat-format';
import type { PlotSeries } from './plot-inputs';

/** A trial's Findings (live or saved) in the shared view, every choice read from its own context. */
export function FindingsResultView({ findings, treatmentNames, interaction }: { findings: Findings; treatmentNames?: Record<string, string>; interaction?: PlotSeries[] }) {
  const { context } = findings;
  // The engine lists means in the order the data came; people read them in the protocol's order.
  const order = treatmentNames ? Object.keys(treatmentNames) : [];
  const answer = order.length ? { ...findings, means: inProtocolOrder(findings.means, order) } : findings;
  return (
    <FindingsView
      answer={answer}
      method={context.choices.method}
      alpha={context.choices.alpha}
      control={context.controlCode ?? undefined}
      decimals={context.measure.decimals}
      unit={context.measure.unit}
      higherIsBetter={context.measure.higherIsBetter}
      treatmentNames={treatmentNames}
      percentOfControl={context.percentOfControl}
      notices={context.notices}
      rankTest={{ kind: context.rankTest.test, answer: context.rankTest }}
      plots={{ ...contextPlots(context), interaction }}
    />
  );
}

/** "drain time (s) · Day 14 · all sites combined (…)", the line above an analysis (rounds over time: "Day 0 to Day 14"); also from the values' summary. */
export function FindingsCaption({ findings }: { findings: Pick<FindingsAnswer, 'context'> | { context: Pick<FindingsAnswer['context'], 'measure' | 'round' | 'scope'> } }) {
  const { measure, round, scope } = findings.context;
  const rounds = 'rounds' in findings.context && findings.context.rounds && findings.context.rounds.length > 1 ? findings.context.rounds : null;
  return (
    <>
      <strong>{measure.name}</strong> ({measure.unit}) · {rounds ? `${rounds[0]!.label} to ${rounds[rounds.length - 1]!.label}` : round.label} · {scope.label}
      {scope.siteNames.length > 1 ? ` (${scope.siteNames.join(', ')})` : ''}
    </>
  );
}
