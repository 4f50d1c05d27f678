import { useParams } from 'react-router-dom';
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

export function AcceptInvitationRoute() {
  return <AcceptInvitationPage token={useParams().token ?? ''} />;
}
