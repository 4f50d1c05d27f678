import { LedgerPage } from '../../features/ledger/components/ledger-page';
import { useTrialOutlet } from '../layouts/trial-layout';

// Its own chunk (router.tsx): the grid library is heavy and loads with the Ledger alone.
export function LedgerRoute() {
  return <LedgerPage trial={useTrialOutlet().trial} />;
}
