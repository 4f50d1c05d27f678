import type { TrialDetail } from '@friable/contracts';

/** Placeholder until this page is built: the protocol (treatments, measures, rounds). */
export function ProtocolPage({ trial }: { trial: TrialDetail }) {
  return <p className="fr-muted">This page will show {trial.title}: the protocol (treatments, measures, rounds).</p>;
}
