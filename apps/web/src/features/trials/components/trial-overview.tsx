import { H2, HTMLTable } from '@blueprintjs/core';
import { ErrorState, LoadingState } from '../../../components/states';
import { designLabels, formatDate, roleLabels } from '../../../lib/format';
import { useTrial } from '../api/get-trial';
import { TrialStatusTag } from './trial-status-tag';

export function TrialOverview({ trialId }: { trialId: number }) {
  const trial = useTrial(trialId);
  if (trial.isPending) return <LoadingState what="the trial" />;
  if (trial.isError) return <ErrorState title="This trial could not be opened" error={trial.error} onRetry={() => trial.refetch()} />;
  const t = trial.data;
  return (
    <section aria-labelledby="trial-heading">
      <H2 id="trial-heading">{t.title}</H2>
      <HTMLTable compact className="fr-facts">
        <tbody>
          <tr>
            <th scope="row">Code</th>
            <td className="fr-code">{t.code}</td>
          </tr>
          <tr>
            <th scope="row">Status</th>
            <td>
              <TrialStatusTag status={t.status} />
            </td>
          </tr>
          <tr>
            <th scope="row">Design</th>
            <td>{designLabels[t.design] ?? t.design}</td>
          </tr>
          <tr>
            <th scope="row">Your roles</th>
            <td>{t.myRoles.length ? t.myRoles.map((r) => roleLabels[r]).join(', ') : 'Administrator (read only)'}</td>
          </tr>
          <tr>
            <th scope="row">Last change</th>
            <td>{formatDate(t.updatedAt)}</td>
          </tr>
        </tbody>
      </HTMLTable>
    </section>
  );
}
