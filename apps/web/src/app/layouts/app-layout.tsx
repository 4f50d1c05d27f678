import { Alignment, Button, Navbar, NavbarDivider, NavbarGroup, NavbarHeading } from '@blueprintjs/core';
import { Link, NavLink, Outlet, useNavigate } from 'react-router-dom';
import { paths } from '../../config/paths';
import { useAuth } from '../../features/auth/hooks/auth-context';
import { useOutboxAvailable } from '../../features/outbox/api/get-outbox';
import { RouteBoundary } from '../errors/route-boundary';

/** The frame of every signed-in page: Friable's name, the person, sign-out. */
export function AppLayout() {
  const { user, signOut } = useAuth();
  const navigate = useNavigate();
  // The API answers the Outbox only outside production and only to administrators (it holds every
  // invitation link); the link appears when it does.
  const outbox = useOutboxAvailable(Boolean(user?.isAdmin));
  return (
    <div className="fr-app">
      <Navbar className="fr-topbar">
        <NavbarGroup align={Alignment.START}>
          <NavbarHeading>
            <Link to={paths.home.href()} className="fr-brand" aria-label="Friable, home">
              <img src="/friable.svg" alt="" width={24} height={24} />
              <span>Friable</span>
            </Link>
          </NavbarHeading>
          <NavbarDivider />
          <NavLink to={paths.trials.href()} className="fr-nav-link">
            Trials
          </NavLink>
          <NavLink to={paths.rateCalculator.href()} className="fr-nav-link">
            Rate calculator
          </NavLink>
          <NavLink to={paths.quickAnalysis.href()} className="fr-nav-link">
            Quick analysis
          </NavLink>
          <NavLink to={paths.planner.href()} className="fr-nav-link">
            Planner
          </NavLink>
          {user?.isAdmin && (
            <NavLink to={paths.people.href()} className="fr-nav-link">
              People
            </NavLink>
          )}
          {outbox && (
            <NavLink to={paths.outbox.href()} className="fr-nav-link fr-outbox-link">
              Outbox
            </NavLink>
          )}
        </NavbarGroup>
        <NavbarGroup align={Alignment.END}>
          <Link to={paths.account.href()} className="fr-person" aria-label={`Your account: ${user?.name ?? ''}`} title="Your account: name, numbers, e-mails, password">
            <span className="fr-person__name">{user?.name}</span>
            <span className="fr-person__email">{user?.email}</span>
          </Link>
          <Button
            variant="minimal"
            icon="log-out"
            text="Sign out"
            aria-label="Sign out"
            className="fr-sign-out"
            onClick={() => {
              signOut();
              navigate(paths.signIn.href());
            }}
          />
        </NavbarGroup>
      </Navbar>
      <main className="fr-main">
        <RouteBoundary>
          <Outlet />
        </RouteBoundary>
      </main>
      <footer className="fr-footer">
        Friable gives decision support, not advice. Follow product labels, local rules and your soil-testing laboratory.
      </footer>
    </div>
  );
}
