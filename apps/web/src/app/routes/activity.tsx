import { ActivityPage } from '../../features/activity/components/activity-page';
import { useMembers } from '../../lib/api/get-members';
import { useTrialOutlet } from '../layouts/trial-layout';

/** The Activity tab: the trial's members (one entry per person) feed its person filter. */
export function ActivityRoute() {
  const { trial } = useTrialOutlet();
  const members = useMembers(trial.id);
  const people = [...new Map((members.data ?? []).map((member) => [member.userId, { userId: member.userId, name: member.name }])).values()];
  return <ActivityPage trial={trial} people={people} />;
}
