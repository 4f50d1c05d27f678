import type { CellConflict } from '../hooks/use-cell-save';
import { EditConflictDialog } from '../../../components/edit-conflict-dialog';
import { cellText } from '../../../lib/observation-text';
import { formatMoment } from '../../../lib/format-moment';

/** Someone else changed the value meanwhile: both values side by side, and the person chooses. */
export function ConflictDialog({ conflict, onKeepMine, onTakeCurrent }: { conflict: CellConflict | null; onKeepMine: () => void; onTakeCurrent: () => void }) {
  if (!conflict) return null;
  const { target, mine, current } = conflict;
  return (
    <EditConflictDialog
      title="Someone else changed this value"
      intro={
        <>
          While you were editing <strong>{target.measureName}</strong> of plot <strong>{target.plotLabel}</strong>, the value was saved by someone else.
        </>
      }
      rows={[
        {
          label: target.measureName,
          mine: mine.value === '' ? '(empty)' : mine.value,
          stored: (
            <>
              {current ? cellText(current) || '(empty)' : '(no value)'}
              {current && (
                <span className="fr-muted fr-small">
                  {' '}
                  by {current.recordedBy ?? 'someone'}, {formatMoment(current.recordedAt)}
                </span>
              )}
            </>
          ),
        },
      ]}
      takeText="Take the stored value"
      onKeepMine={onKeepMine}
      onTakeStored={onTakeCurrent}
    />
  );
}
