import type { TrialDetail } from '@friable/contracts';

/** The printable report of a trial (filled in below). */
export function ReportPage({ trial }: { trial: TrialDetail }) {
  return <p>Report of {trial.title}</p>;
}
