import { useEffect } from 'react';
import { useAuth } from '../../features/auth/hooks/auth-context';
import { FindingsPage } from '../../features/findings/components/findings-page';
import { QuickAnalysisPage } from '../../features/findings/components/quick-analysis-page';
import { ReportPage } from '../../features/findings/components/report-page';
import { useTrialOutlet } from '../layouts/trial-layout';

// This module is the Findings pages' chunk, loaded with their route (router.tsx); their plots load
// later still, only when drawn.

export function QuickAnalysisRoute() {
  return <QuickAnalysisPage />;
}

/** The Findings plots' code (with the charting library), asked for as the page opens, while its analysis is computed. */
const loadFindingsPlots = () => import('../../features/findings/components/findings-plots');

export function FindingsRoute() {
  const { trial } = useTrialOutlet();
  const { user } = useAuth();
  useEffect(() => {
    void loadFindingsPlots();
  }, []);
  return <FindingsPage trial={trial} meId={user?.id} />;
}

export function ReportRoute() {
  const { trial } = useTrialOutlet();
  return <ReportPage trial={trial} />;
}
