import type { TrialDetail } from '@friable/contracts';
import { useLayoutImpact } from '../api/get-layout-impact';
import { TypedConfirmDialog } from './typed-confirm-dialog';

/** A change waiting for its confirmation: what it is, which layouts it touches, and what to do once confirmed. */
export interface PendingLayoutChange {
  /** "Remove treatment GYP (Gypsum)". */
  what: string;
  /** One site's layout; absent: every site's. */
  siteId?: number;
  /** The button's words: "Remove treatment". */
  confirmText: string;
  proceed: () => void;
}

/**
 * Before a change that clears plot layouts (the design, adding or removing a treatment, removing a site): the
 * server says exactly what would be lost ("Clears the layouts of 3 sites, 60 plots …"); when layouts would go, the
 * person types the trial's code to go on. Values recorded refuse the change, and the dialog says so instead.
 * Nothing to clear: it asks once.
 */
export function LayoutChangeConfirm({ trial, change, onClose }: { trial: TrialDetail; change: PendingLayoutChange | null; onClose: () => void }) {
  const impact = useLayoutImpact(trial.id, change?.siteId, change !== null);
  const data = impact.data;
  const answer = data && {
    summary: data.summary,
    linesLabel: 'Layouts it clears',
    lines: data.sites.map((site) => `${site.siteName}: ${site.plots} plots${site.values > 0 ? `, ${site.values} values recorded` : ''}`),
    refusal: data.refusal,
    needsTyping: data.layouts > 0,
  };
  return (
    <TypedConfirmDialog
      isOpen={change !== null}
      title={change?.what ?? ''}
      confirmText={change?.confirmText ?? 'Confirm'}
      trialCode={trial.code}
      loadingWhat="what this change would clear"
      impact={{ pending: impact.isPending, error: impact.error, retry: () => void impact.refetch(), answer }}
      onConfirm={() => change?.proceed()}
      onClose={onClose}
    />
  );
}
