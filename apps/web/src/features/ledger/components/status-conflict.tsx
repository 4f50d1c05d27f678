import type { TrialDetail } from '@friable/contracts';
import { conflictText, EditConflictDialog } from '../../../components/edit-conflict-dialog';
import type { EditConflict } from '../../../lib/edit-conflict';
import type { StatusChoice } from '../hooks/use-trial-status-change';

const statusWords: Record<string, string> = { draft: 'Draft', active: 'Open for data', locked: 'Locked for analysis', archived: 'Archived' };

/** A lock or unlock refused because someone else saved the trial first: the status chosen and the stored one. */
export function StatusConflict({ conflict, onKeepMine, onTakeStored }: { conflict: EditConflict<StatusChoice, TrialDetail> | null; onKeepMine: () => void; onTakeStored: () => void }) {
  if (!conflict) return null;
  const { mine, current } = conflict;
  const differs = mine.status !== current.status;
  const rows = differs ? [{ label: 'Status', mine: statusWords[mine.status] ?? conflictText(mine.status), stored: statusWords[current.status] ?? conflictText(current.status) }] : [];
  return (
    <EditConflictDialog
      title={`Someone else changed trial ${current.code}`}
      intro={
        <>
          While you were {mine.status === 'locked' ? 'locking' : 'unlocking'} the trial, someone else saved it.
          {!differs && ' It already has the status you chose.'}
        </>
      }
      rows={rows}
      labelled
      takeText="Leave it as stored"
      onKeepMine={onKeepMine}
      onTakeStored={onTakeStored}
    />
  );
}
