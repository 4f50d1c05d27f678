import { createBrowserRouter, Navigate, type RouteObject } from 'react-router-dom';
import { paths } from '../config/paths';
import { RequireAuth } from '../features/auth/components/require-auth';
import { OutboxPage } from '../features/outbox/components/outbox-page';
import { RateCalculatorPage } from '../features/rates/components/rate-calculator-page';
import { AppLayout } from './layouts/app-layout';
import { TrialLayout } from './layouts/trial-layout';
import { AccountRoute, ForgotPasswordRoute, ResetPasswordRoute } from './routes/account';
import { ActivityRoute } from './routes/activity';
import { FindingsRoute, QuickAnalysisRoute, ReportRoute } from './routes/findings-routes';
import { NotFoundRoute } from './routes/not-found';
import { PlannerRoute } from './routes/planner';
import { SignInRoute } from './routes/sign-in';
import { AcceptInvitationRoute, IntakeRoute, LedgerRoute, PlotPlanRoute, ProtocolRoute, SitesRoute, TeamRoute } from './routes/trial-sections';
import { TrialsRoute } from './routes/trials';
import { PeopleRoute } from './routes/people';

export const routes: RouteObject[] = [
  { path: paths.signIn.path, element: <SignInRoute /> },
  // Opened from an e-mail by someone who may not have an account yet.
  { path: paths.acceptInvitation.path, element: <AcceptInvitationRoute /> },
  { path: paths.forgotPassword.path, element: <ForgotPasswordRoute /> },
  { path: paths.resetPassword.path, element: <ResetPasswordRoute /> },
  {
    path: paths.home.path,
    element: (
      <RequireAuth>
        <AppLayout />
      </RequireAuth>
    ),
    children: [
      { index: true, element: <Navigate to={paths.trials.href()} replace /> },
      { path: paths.trials.path, element: <TrialsRoute /> },
      {
        path: paths.trial.path,
        element: <TrialLayout />,
        children: [
          { index: true, element: <Navigate to="protocol" replace /> },
          { path: paths.trialProtocol.path, element: <ProtocolRoute /> },
          { path: paths.trialSites.path, element: <SitesRoute /> },
          { path: paths.trialPlotPlan.path, element: <PlotPlanRoute /> },
          { path: paths.trialTeam.path, element: <TeamRoute /> },
          { path: paths.trialIntake.path, element: <IntakeRoute /> },
          { path: paths.trialLedger.path, element: <LedgerRoute /> },
          { path: paths.trialFindings.path, element: <FindingsRoute /> },
          { path: paths.trialReport.path, element: <ReportRoute /> },
          { path: paths.trialActivity.path, element: <ActivityRoute /> },
          { path: paths.trialActivity.path, element: <ActivityRoute /> },
        ],
      },
      { path: paths.rateCalculator.path, element: <RateCalculatorPage /> },
      { path: paths.quickAnalysis.path, element: <QuickAnalysisRoute /> },
      { path: paths.planner.path, element: <PlannerRoute /> },
      { path: paths.outbox.path, element: <OutboxPage /> },
      { path: paths.people.path, element: <PeopleRoute /> },
      { path: paths.account.path, element: <AccountRoute /> },
      { path: '*', element: <NotFoundRoute /> },
    ],
  },
];

export function createRouter() {
  return createBrowserRouter(routes);
}
