import type { TrialDetail } from '@friable/contracts';

/** Placeholder until this page is built: the sites. */
export function SitesPage({ trial }: { trial: TrialDetail }) {
  return <p className="fr-muted">This page will show {trial.title}: the sites.</p>;
}
