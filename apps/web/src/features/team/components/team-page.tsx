import type { TrialDetail } from '@friable/contracts';

/** Placeholder until this page is built: the team. */
export function TeamPage({ trial }: { trial: TrialDetail }) {
  return <p className="fr-muted">This page will show {trial.title}: the team.</p>;
}
