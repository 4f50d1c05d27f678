import type { RemovalImpactSite, TrialDetail } from '@friable/contracts';
import { formatNumber } from '../../../lib/format';
import { useRemovalImpact, type RemovableWithData } from '../api/get-removal-impact';
import { TypedConfirmDialog } from './typed-confirm-dialog';

/** A measure or round waiting for its removal to be confirmed. */
export interface PendingRemoval {
  id: number;
  /** "Remove measure DT (Drain time)". */
  what: string;
  /** The button's words: "Remove measure". */
  confirmText: string;
  /** Removes it, with the trial code as typed when the server asked for it. */
  proceed: (confirm: string | undefined) => void;
}

const counted = (n: number, one: string, many: string) => `${formatNumber(n, 0)} ${n === 1 ? one : many}`;

/** "Hollow Lane: 80 values (3 censored, 2 missing), 4 notes, 2 photos". */
function siteLine(site: RemovalImpactSite): string {
  const kinds = [site.censored ? `${formatNumber(site.censored, 0)} censored` : '', site.missing ? `${formatNumber(site.missing, 0)} missing` : ''].filter(Boolean);
  const parts = [
    site.values ? `${counted(site.values, 'value', 'values')}${kinds.length ? ` (${kinds.join(', ')})` : ''}` : '',
    site.notes ? counted(site.notes, 'note', 'notes') : '',
    site.photos ? counted(site.photos, 'photo', 'photos') : '',
  ].filter(Boolean);
  return `${site.siteName}: ${parts.join(', ')}`;
}

/**
 * Before removing a measure or an assessment round: the server says exactly what it archives ("Removes 240 recorded
 * values and 12 notes of Drain time across 3 sites …"); when values or photos would go, the trial's code is typed.
 * The only measure of a round is refused, and the dialog says why.
 */
export function RemovalConfirm({ trial, collection, removal, onClose }: { trial: TrialDetail; collection: RemovableWithData; removal: PendingRemoval | null; onClose: () => void }) {
  const impact = useRemovalImpact(trial.id, collection, removal?.id);
  const data = impact.data;
  const answer = data && { summary: data.summary, linesLabel: 'What it archives, site by site', lines: data.sites.map(siteLine), refusal: data.refusal, needsTyping: data.confirmationNeeded };
  return (
    <TypedConfirmDialog
      isOpen={removal !== null}
      title={removal?.what ?? ''}
      confirmText={removal?.confirmText ?? 'Remove'}
      trialCode={trial.code}
      loadingWhat="what this removal would archive"
      impact={{ pending: impact.isPending, error: impact.error, retry: () => void impact.refetch(), answer }}
      onConfirm={(typed) => removal?.proceed(typed)}
      onClose={onClose}
    />
  );
}
