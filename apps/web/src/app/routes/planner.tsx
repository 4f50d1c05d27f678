import { PlannerPage } from '../../features/planner/components/planner-page';
import { useTrials } from '../../features/trials/api/get-trials';

/** The Planner, offered the person's trials to take a CV from their saved analyses. */
export function PlannerRoute() {
  const trials = useTrials();
  return <PlannerPage trials={trials.data ?? []} />;
}
