import { Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { paths } from '../../config/paths';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { useAuth } from '../../features/auth/hooks/auth-context';

function safeReturnPath(value: string | null): string {
  // Only paths inside the app: never an address elsewhere.
  return value && value.startsWith('/') && !value.startsWith('//') ? value : paths.trials.href();
}

export function SignInRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const { signedIn } = useAuth();
  const returnTo = safeReturnPath(params.get('returnTo'));
  if (signedIn) return <Navigate to={returnTo} replace />;
  return (
    <div className="fr-sign-in-page">
      <div className="fr-sign-in-page__brand">
        <img src="/friable.svg" alt="" width={40} height={40} />
        <span>Friable</span>
      </div>
      <SignInForm onSignedIn={() => navigate(returnTo, { replace: true })} />
    </div>
  );
}
