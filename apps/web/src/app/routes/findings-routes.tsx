import { lazy, Suspense, useEffect } from 'react';
import { LoadingState } from '../../components/states';
import { useAuth } from '../../features/auth/hooks/auth-context';
import { useTrialOutlet } from '../layouts/trial-layout';

// The Findings pages load with their route (their plots load later still, only when drawn).
const QuickAnalysisPage = lazy(() => import('../../features/findings/components/quick-analysis-page').then((m) => ({ default: m.QuickAnalysisPage })));
const FindingsPage = lazy(() => import('../../features/findings/components/findings-page').then((m) => ({ default: m.FindingsPage })));
const ReportPage = lazy(() => import('../../features/findings/components/report-page').then((m) => ({ default: m.ReportPage })));

export function QuickAnalysisRoute() {
  return (
    <Suspense fallback={<LoadingState what="Quick analysis" />}>
      <QuickAnalysisPage />
    </Suspense>
  );
}

/** The Findings plots' code (with the charting library), asked for as the page opens, while its analysis is computed. */
const loadFindingsPlots = () => import('../../features/findings/components/findings-plots');

export function FindingsRoute() {
  const { trial } = useTrialOutlet();
  const { user } = useAuth();
  useEffect(() => {
    void loadFindingsPlots();
  }, []);
  return (
    <Suspense fallback={<LoadingState what="the Findings" />}>
      <FindingsPage trial={trial} meId={user?.id} />
    </Suspense>
  );
}

export function ReportRoute() {
  const { trial } = useTrialOutlet();
  return (
    <Suspense fallback={<LoadingState what="the report" />}>
      <ReportPage trial={trial} />
    </Suspense>
  );
}
