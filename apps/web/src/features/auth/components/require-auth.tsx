import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router-dom';
import { LoadingState } from '../../../components/states';
import { paths } from '../../../config/paths';
import { useAuth } from '../hooks/auth-context';

/** Sends a signed-out visitor to sign-in, and back to where they were going afterwards. */
export function RequireAuth({ children }: { children: ReactNode }) {
  const { signedIn, user, checking } = useAuth();
  const location = useLocation();
  if (!signedIn) return <Navigate to={paths.signIn.href(location.pathname + location.search)} replace />;
  if (checking || !user) return <LoadingState what="your account" />;
  return <>{children}</>;
}
