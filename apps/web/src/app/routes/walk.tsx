import { WalkPage } from '../../features/walk/components/walk-page';
import { useTrialOutlet } from '../layouts/trial-layout';

// Its own chunk (router.tsx): the Round walk and its IndexedDB queue load when a person opens it.
export function WalkRoute() {
  return <WalkPage trial={useTrialOutlet().trial} />;
}
