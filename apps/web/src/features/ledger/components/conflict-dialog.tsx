import { Button, Dialog, DialogBody, DialogFooter } from '@blueprintjs/core';
import type { CellConflict } from '../hooks/use-cell-save';
import { cellText } from '../../../lib/observation-text';
import { formatMoment } from '../../../lib/format-moment';

/** Someone else changed the value meanwhile: both values side by side, and the person chooses. */
export function ConflictDialog({ conflict, onKeepMine, onTakeCurrent }: { conflict: CellConflict | null; onKeepMine: () => void; onTakeCurrent: () => void }) {
  if (!conflict) return null;
  const { target, mine, current } = conflict;
  return (
    <Dialog isOpen title="Someone else changed this value" icon="swap-horizontal" onClose={onTakeCurrent} className="fr-dialog">
      <DialogBody>
        <p>
          While you were editing <strong>{target.measureName}</strong> of plot <strong>{target.plotLabel}</strong>, the value was saved by someone else. Nothing was
          overwritten; choose which value stays.
        </p>
        <dl className="fr-ledger-conflict">
          <dt>Yours</dt>
          <dd className="fr-ledger-conflict__value">{mine.value === '' ? '(empty)' : mine.value}</dd>
          <dt>Stored now</dt>
          <dd className="fr-ledger-conflict__value">
            {current ? cellText(current) || '(empty)' : '(no value)'}
            {current && (
              <span className="fr-muted fr-small">
                {' '}
                by {current.recordedBy ?? 'someone'}, {formatMoment(current.recordedAt)}
              </span>
            )}
          </dd>
        </dl>
      </DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text="Take the stored value" onClick={onTakeCurrent} />
            <Button intent="primary" text="Keep mine" onClick={onKeepMine} />
          </>
        }
      />
    </Dialog>
  );
}
