import { lazy, Suspense } from 'react';
import { useParams } from 'react-router-dom';
import { LoadingState } from '../../components/states';
import { IntakePage } from '../../features/intake/components/intake-page';
import { PlotPlanPage } from '../../features/protocol/components/plot-plan-page';
import { ProtocolPage } from '../../features/protocol/components/protocol-page';
import { SitesPage } from '../../features/protocol/components/sites-page';
import { TeamPage } from '../../features/team/components/team-page';
import { AcceptInvitationPage } from '../../features/team/components/accept-invitation-page';
import { useTrialOutlet } from '../layouts/trial-layout';

export function ProtocolRoute() {
  return <ProtocolPage trial={useTrialOutlet().trial} />;
}

export function SitesRoute() {
  return <SitesPage trial={useTrialOutlet().trial} />;
}

export function PlotPlanRoute() {
  return <PlotPlanPage trial={useTrialOutlet().trial} />;
}

export function TeamRoute() {
  return <TeamPage trial={useTrialOutlet().trial} />;
}

export function IntakeRoute() {
  return <IntakePage trial={useTrialOutlet().trial} />;
}

// The grid library is heavy: it loads with the Ledger, not with the app.
const LedgerPage = lazy(() => import('../../features/ledger/components/ledger-page').then((module) => ({ default: module.LedgerPage })));

export function LedgerRoute() {
  const { trial } = useTrialOutlet();
  return (
    <Suspense fallback={<LoadingState what="the Ledger" />}>
      <LedgerPage trial={trial} />
    </Suspense>
  );
}

// The Round walk (and its IndexedDB queue) loads when a person opens it, not with the app.
const WalkPage = lazy(() => import('../../features/walk/components/walk-page').then((module) => ({ default: module.WalkPage })));

export function WalkRoute() {
  const { trial } = useTrialOutlet();
  return (
    <Suspense fallback={<LoadingState what="the Round walk" />}>
      <WalkPage trial={trial} />
    </Suspense>
  );
}

export function AcceptInvitationRoute() {
  return <AcceptInvitationPage token={useParams().token ?? ''} />;
}
