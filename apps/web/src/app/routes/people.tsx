import { PeoplePage } from '../../features/people/components/people-page';
import { useAuth } from '../../features/auth/hooks/auth-context';

export function PeopleRoute() {
  const { user } = useAuth();
  return user ? <PeoplePage me={user} /> : null;
}
