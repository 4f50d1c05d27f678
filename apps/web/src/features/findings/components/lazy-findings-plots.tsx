import { lazy, Suspense } from 'react';
import { LoadingState } from '../../../components/states';
import type { FindingsPlotsProps } from './findings-plots';

// Plotly is large: it loads only when a page draws plots, never with the app.
const FindingsPlots = lazy(() => import('./findings-plots'));

/** The Findings plots, loaded on first use with a loading line in their place. */
export function LazyFindingsPlots(props: FindingsPlotsProps) {
  return (
    <Suspense fallback={<LoadingState what="the plots" />}>
      <FindingsPlots {...props} />
    </Suspense>
  );
}
