import { Button, NonIdealState } from '@blueprintjs/core';
import { QueryErrorResetBoundary } from '@tanstack/react-query';
import { Suspense, useState, type ReactNode } from 'react';
import { ErrorBoundary, type FallbackProps } from 'react-error-boundary';
import { useLocation } from 'react-router-dom';
import { LoadingState } from '../../components/states';
import { browserPage, isStaleChunkError, reloadOnceForNewVersion } from './stale-chunk';

/**
 * Around each page: a failure while it loads or draws shows a message and a way to try again in
 * place of the page (the navigation and the trial header stay), and a page whose code is from an
 * older version of the app reloads once. Moving to another address clears the failure.
 */
export function RouteBoundary({ children, what = 'the page' }: { children: ReactNode; what?: string }) {
  const { pathname } = useLocation();
  return (
    <QueryErrorResetBoundary>
      {({ reset }) => (
        <ErrorBoundary FallbackComponent={RouteFailure} onReset={reset} resetKeys={[pathname]}>
          <Suspense fallback={<LoadingState what={what} />}>{children}</Suspense>
        </ErrorBoundary>
      )}
    </QueryErrorResetBoundary>
  );
}

export function RouteFailure({ error, resetErrorBoundary }: FallbackProps) {
  const stale = isStaleChunkError(error);
  // Decided once, when the failure shows: reload now, or (reloaded a moment ago already) say so.
  const [reloading] = useState(() => stale && reloadOnceForNewVersion());
  if (reloading) return <LoadingState what="the new version of Friable" />;
  if (stale) {
    return (
      <NonIdealState
        icon="refresh"
        title="Friable was updated"
        description="This page needs the new version, which could not be loaded. Check your connection and reload the page."
        action={<Button intent="primary" icon="refresh" text="Reload the page" onClick={() => browserPage.reload()} />}
      />
    );
  }
  return (
    <NonIdealState
      icon="warning-sign"
      title="This page ran into a problem"
      description="Something went wrong while showing this page. Try again; if it keeps happening, reload the page."
      action={<Button intent="primary" icon="refresh" text="Try again" onClick={resetErrorBoundary} />}
    />
  );
}

