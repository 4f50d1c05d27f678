import { useAuth } from '../../features/auth/hooks/auth-context';
import { FindingsPage } from '../../features/findings/components/findings-page';
import { QuickAnalysisPage } from '../../features/findings/components/quick-analysis-page';
import { ReportPage } from '../../features/findings/components/report-page';
import { useTrialOutlet } from '../layouts/trial-layout';

// This module is the Findings pages' chunk, loaded with their route (router.tsx); the charting library
// loads later still, with the first chart that comes into view.

export function QuickAnalysisRoute() {
  return <QuickAnalysisPage />;
}

export function FindingsRoute() {
  const { trial } = useTrialOutlet();
  const { user } = useAuth();
  return <FindingsPage trial={trial} meId={user?.id} />;
}

export function ReportRoute() {
  const { trial } = useTrialOutlet();
  return <ReportPage trial={trial} />;
}
