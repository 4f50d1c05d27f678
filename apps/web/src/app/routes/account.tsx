import { useNavigate, useParams } from 'react-router-dom';
import { paths } from '../../config/paths';
import { AccountPage } from '../../features/auth/components/account-page';
import { ForgotPasswordPage, ResetPasswordPage } from '../../features/auth/components/password-reset-pages';
import { useAuth } from '../../features/auth/hooks/auth-context';

export function AccountRoute() {
  const { user, signOut } = useAuth();
  const navigate = useNavigate();
  if (!user) return null;
  return (
    <AccountPage
      me={user}
      onSignedOutEverywhere={() => {
        signOut('You signed out on every device.');
        navigate(paths.signIn.href());
      }}
    />
  );
}

/** The public pages of a forgotten password, framed like the sign-in page. */
function Framed({ children }: { children: React.ReactNode }) {
  return (
    <div className="fr-sign-in-page">
      <div className="fr-sign-in-page__brand">
        <img src="/friable.svg" alt="" width={40} height={40} />
        <span>Friable</span>
      </div>
      {children}
    </div>
  );
}

export function ForgotPasswordRoute() {
  return (
    <Framed>
      <ForgotPasswordPage />
    </Framed>
  );
}

export function ResetPasswordRoute() {
  const { token = '' } = useParams();
  return (
    <Framed>
      <ResetPasswordPage token={token} />
    </Framed>
  );
}
