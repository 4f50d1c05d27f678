import { PlannerPage } from '../../features/planner/components/planner-page';

export function PlannerRoute() {
  return <PlannerPage />;
}
