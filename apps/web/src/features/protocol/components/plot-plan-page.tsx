import type { TrialDetail } from '@friable/contracts';

/** Placeholder until this page is built: the plot plan. */
export function PlotPlanPage({ trial }: { trial: TrialDetail }) {
  return <p className="fr-muted">This page will show {trial.title}: the plot plan.</p>;
}
