import type { TrialDetail } from '@friable/contracts';
import { H2 } from '@blueprintjs/core';
import { useEffect } from 'react';
import { NavLink, Outlet, useLocation, useOutletContext, useParams } from 'react-router-dom';
import { ErrorState, LoadingState } from '../../components/states';
import { TrialStatusTag } from '../../components/trial-status-tag';
import { paths } from '../../config/paths';
import { designLabels, roleLabels } from '../../lib/format';
import { useTrial } from '../../lib/api/get-trial';
import { RouteBoundary } from '../errors/route-boundary';

export interface TrialOutletContext {
  trial: TrialDetail;
}

/** The trial's pages read the loaded protocol from here. */
export function useTrialOutlet(): TrialOutletContext {
  return useOutletContext<TrialOutletContext>();
}

const sections: Array<{ label: string; href: (id: number) => string; shownTo?: (trial: TrialDetail) => boolean }> = [
  { label: 'Protocol', href: paths.trialProtocol.href },
  { label: 'Sites', href: paths.trialSites.href },
  { label: 'Plot plan', href: (id: number) => paths.trialPlotPlan.href(id) },
  { label: 'Team', href: paths.trialTeam.href },
  // Reviewers write no data, so they get no Intake tab.
  { label: 'Intake', href: (id: number) => paths.trialIntake.href(id), shownTo: (t: TrialDetail) => t.myRoles.some((role) => role !== 'reviewer') },
  { label: 'Ledger', href: (id: number) => paths.trialLedger.href(id) },
  // Plot by plot on a phone, for those who record values.
  { label: 'Round walk', href: (id: number) => paths.trialWalk.href(id), shownTo: (t: TrialDetail) => t.myRoles.some((role) => role !== 'reviewer') },
  { label: 'Findings', href: paths.trialFindings.href },
  { label: 'Activity', href: paths.trialActivity.href },
];

/** A trial's header and section tabs around its pages. */
export function TrialLayout({ preloadSection }: { preloadSection?: (pathname: string) => void }) {
  const trialId = Number(useParams().trialId);
  const trial = useTrial(trialId);
  const { pathname } = useLocation();
  // The section's code is fetched while the trial loads, not after.
  useEffect(() => preloadSection?.(pathname), [preloadSection, pathname]);
  if (!Number.isInteger(trialId) || trialId < 1) return <ErrorState title="No such trial" error={new Error('The address does not name a trial.')} />;
  if (trial.isPending) return <LoadingState what="the trial" />;
  if (trial.isError) return <ErrorState title="This trial could not be opened" error={trial.error} onRetry={() => trial.refetch()} />;
  const t = trial.data;
  return (
    <div className="fr-trial">
      <header className="fr-trial__header">
        <H2 className="fr-trial__title">{t.title}</H2>
        <div className="fr-trial__meta">
          <span className="fr-code">{t.code}</span>
          <TrialStatusTag status={t.status} />
          <span>{designLabels[t.design] ?? t.design}</span>
          <span className="fr-muted">
            You: {t.myRoles.length ? t.myRoles.map((r) => roleLabels[r]).join(', ') : 'Administrator (read only)'}
          </span>
        </div>
      </header>
      <nav className="fr-tabs" aria-label="Trial sections">
        {sections.filter((section) => section.shownTo?.(t) ?? true).map((section) => (
          <NavLink key={section.label} to={section.href(t.id)} className="fr-tab">
            {section.label}
          </NavLink>
        ))}
      </nav>
      <RouteBoundary>
        <Outlet context={{ trial: t } satisfies TrialOutletContext} />
      </RouteBoundary>
    </div>
  );
}
