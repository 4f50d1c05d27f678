import { createBrowserRouter, Navigate, type RouteObject } from 'react-router-dom';
import { paths } from '../config/paths';
import { RequireAuth } from '../features/auth/components/require-auth';
import { AppLayout } from './layouts/app-layout';
import { NotFoundRoute } from './routes/not-found';
import { SignInRoute } from './routes/sign-in';
import { TrialRoute } from './routes/trial';
import { TrialsRoute } from './routes/trials';

export const routes: RouteObject[] = [
  { path: paths.signIn.path, element: <SignInRoute /> },
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
      { path: paths.trial.path, element: <TrialRoute /> },
      { path: '*', element: <NotFoundRoute /> },
    ],
  },
];

export function createRouter() {
  return createBrowserRouter(routes);
}
