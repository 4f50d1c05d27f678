import { useParams } from 'react-router-dom';
import { ErrorState } from '../../components/states';
import { TrialOverview } from '../../features/trials/components/trial-overview';

export function TrialRoute() {
  const trialId = Number(useParams().trialId);
  if (!Number.isInteger(trialId) || trialId < 1) return <ErrorState title="No such trial" error={new Error('The address does not name a trial.')} />;
  return <TrialOverview trialId={trialId} />;
}
