import { Drawer, HTMLTable } from '@blueprintjs/core';
import { EmptyState, ErrorState, LoadingState } from '../../../components/states';
import { useObservationHistory } from '../api/get-observation-history';
import { formatMoment } from '../../../lib/format-moment';
import { ColumnHeads } from '../../../components/column-heads';

/** Every change of one value, newest first: who, when, the old and the new value, by upload or by edit. */
export function HistoryDrawer({ trialId, observationId, title, onClose }: { trialId: number; observationId: number | null; title: string; onClose: () => void }) {
  const history = useObservationHistory(trialId, observationId);
  return (
    <Drawer isOpen={observationId !== null} onClose={onClose} title={title} icon="history" size="min(560px, 100vw)" className="fr-ledger-history">
      <div className="fr-ledger-history__body">
        {history.isPending ? (
          <LoadingState what="the history" />
        ) : history.isError ? (
          <ErrorState title="The history could not be loaded" error={history.error} onRetry={() => history.refetch()} />
        ) : history.data.length === 0 ? (
          <EmptyState title="No changes yet" description="This value has not been changed since it was first recorded." />
        ) : (
          <HTMLTable compact striped aria-label="History of this value">
            <ColumnHeads names={['When', 'Who', 'Before', 'After', 'How']} />
            <tbody>
              {[...history.data]
                .sort((a, b) => b.at.localeCompare(a.at))
                .map((entry, index) => (
                  <tr key={index}>
                    <td>{formatMoment(entry.at)}</td>
                    <td>{entry.by ?? 'unknown'}</td>
                    <td className="fr-num">{entry.before ?? '—'}</td>
                    <td className="fr-num">{entry.after ?? '—'}</td>
                    <td>{entry.source === 'upload' ? 'by upload' : 'by edit'}</td>
                  </tr>
                ))}
            </tbody>
          </HTMLTable>
        )}
      </div>
    </Drawer>
  );
}
