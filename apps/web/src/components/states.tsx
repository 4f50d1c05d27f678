import { Button, NonIdealState, Spinner } from '@blueprintjs/core';
import type { ReactElement, ReactNode } from 'react';

/** Loading, in words. */
export function LoadingState({ what }: { what: string }) {
  return (
    <div className="fr-state" role="status" aria-live="polite">
      <Spinner size={28} />
      <span>Loading {what}…</span>
    </div>
  );
}

/** A failure, in words, with a way to try again. */
export function ErrorState({ title, error, onRetry }: { title: string; error: unknown; onRetry?: () => void }) {
  const message = error instanceof Error ? error.message : 'Something went wrong.';
  return (
    <NonIdealState
      icon="warning-sign"
      title={title}
      description={message}
      action={onRetry ? <Button icon="refresh" text="Try again" onClick={onRetry} /> : undefined}
    />
  );
}

export function EmptyState({ title, description, action }: { title: string; description: ReactNode; action?: ReactElement }) {
  return <NonIdealState icon="layout-grid" title={title} description={description} action={action} />;
}
