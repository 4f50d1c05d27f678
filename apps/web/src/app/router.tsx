import { matchPath, Navigate, useRoutes, type RouteObject } from 'react-router-dom';
import { paths } from '../config/paths';
import { RequireAuth } from '../features/auth/components/require-auth';
import { RouteBoundary } from './errors/route-boundary';
import { AppLayout } from './layouts/app-layout';
import { TrialLayout } from './layouts/trial-layout';
import { lazyPage } from './lazy-page';
const AccountRoute = lazyPage(() => import('./routes/account'), 'AccountRoute');
const ForgotPasswordRoute = lazyPage(() => import('./routes/account'), 'ForgotPasswordRoute');
const ResetPasswordRoute = lazyPage(() => import('./routes/account'), 'ResetPasswordRoute');
import { SignInRoute } from './routes/sign-in';

// Every page but sign-in loads with its route (its own chunk): the first screen carries only the
// app's frame, sign-in and the trials list. The layouts put each page in a RouteBoundary.
//
// The routes are matched by useRoutes inside a <BrowserRouter> (app.tsx), not by a data router
// (createBrowserRouter): the data router's code is 15 kB of the first screen's 160 kB budget and
// Friable uses none of it (loaders, actions, fetchers, useBlocker). Load data with react-query.
const TrialsRoute = lazyPage(() => import('./routes/trials'), 'TrialsRoute');
const ProtocolRoute = lazyPage(() => import('./routes/trial-sections'), 'ProtocolRoute');
const SitesRoute = lazyPage(() => import('./routes/trial-sections'), 'SitesRoute');
const PlotPlanRoute = lazyPage(() => import('./routes/trial-sections'), 'PlotPlanRoute');
const TeamRoute = lazyPage(() => import('./routes/trial-sections'), 'TeamRoute');
const IntakeRoute = lazyPage(() => import('./routes/trial-sections'), 'IntakeRoute');
const LedgerRoute = lazyPage(() => import('./routes/ledger'), 'LedgerRoute');
const WalkRoute = lazyPage(() => import('./routes/walk'), 'WalkRoute');
const AcceptInvitationRoute = lazyPage(() => import('./routes/trial-sections'), 'AcceptInvitationRoute');
const FindingsRoute = lazyPage(() => import('./routes/findings-routes'), 'FindingsRoute');
const QuickAnalysisRoute = lazyPage(() => import('./routes/findings-routes'), 'QuickAnalysisRoute');
const ReportRoute = lazyPage(() => import('./routes/findings-routes'), 'ReportRoute');
const ActivityRoute = lazyPage(() => import('./routes/activity'), 'ActivityRoute');
const PlannerRoute = lazyPage(() => import('./routes/planner'), 'PlannerRoute');
const PeopleRoute = lazyPage(() => import('./routes/people'), 'PeopleRoute');
const RateCalculatorPage = lazyPage(() => import('../features/rates/components/rate-calculator-page'), 'RateCalculatorPage');
const OutboxPage = lazyPage(() => import('../features/outbox/components/outbox-page'), 'OutboxPage');
const NotFoundRoute = lazyPage(() => import('./routes/not-found'), 'NotFoundRoute');

/** A trial's sections: each page's code loads with it, or earlier while the trial itself loads (preloadTrialSection). */
const trialSections = [
  [paths.trialProtocol.path, ProtocolRoute],
  [paths.trialSites.path, SitesRoute],
  [paths.trialPlotPlan.path, PlotPlanRoute],
  [paths.trialTeam.path, TeamRoute],
  [paths.trialIntake.path, IntakeRoute],
  [paths.trialLedger.path, LedgerRoute],
  [paths.trialWalk.path, WalkRoute],
  [paths.trialFindings.path, FindingsRoute],
  [paths.trialReport.path, ReportRoute],
  [paths.trialActivity.path, ActivityRoute],
] as const;

/** Fetches the code of the trial section at this address, so it arrives with the trial rather than after it. */
function preloadTrialSection(pathname: string) {
  trialSections.find(([path]) => matchPath(path, pathname))?.[1].preload();
}

export const routes: RouteObject[] = [
  {
    path: paths.signIn.path,
    element: (
      <RouteBoundary>
        <SignInRoute />
      </RouteBoundary>
    ),
  },
  // Opened from an e-mail by someone who may not have an account yet.
  {
    path: paths.acceptInvitation.path,
    element: (
      <RouteBoundary what="the invitation">
        <AcceptInvitationRoute />
      </RouteBoundary>
    ),
  },
  {
    path: paths.forgotPassword.path,
    element: (
      <RouteBoundary what="the password reset">
        <ForgotPasswordRoute />
      </RouteBoundary>
    ),
  },
  {
    path: paths.resetPassword.path,
    element: (
      <RouteBoundary what="the password reset">
        <ResetPasswordRoute />
      </RouteBoundary>
    ),
  },
  {
    path: paths.home.path,
    element: (
      <RouteBoundary>
        <RequireAuth>
          <AppLayout />
        </RequireAuth>
      </RouteBoundary>
    ),
    children: [
      { index: true, element: <Navigate to={paths.trials.href()} replace /> },
      { path: paths.trials.path, element: <TrialsRoute /> },
      {
        path: paths.trial.path,
        element: <TrialLayout preloadSection={preloadTrialSection} />,
        children: [
          { index: true, element: <Navigate to="protocol" replace /> },
          ...trialSections.map(([path, Section]) => ({ path, element: <Section /> })),
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

/** The page at the current address. */
export function AppRoutes() {
  return useRoutes(routes);
}
