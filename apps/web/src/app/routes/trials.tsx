import { TrialsList } from '../../features/trials/components/trials-list';

export function TrialsRoute() {
  return <TrialsList />;
}
