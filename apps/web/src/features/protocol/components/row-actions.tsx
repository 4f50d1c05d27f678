import { Button } from '@blueprintjs/core';
import { ConfirmButton } from '../../../components/confirm-button';

/** The Edit and Remove buttons at the end of a protocol table's row (Remove after a clear question; left out where removing is not offered). */
export function RowActions({ name, onEdit, remove }: { name: string; onEdit: () => void; remove?: { confirmText: string; question: string; loading?: boolean; onConfirm: () => void } }) {
  return (
    <td className="fr-actions">
      <Button variant="minimal" size="small" icon="edit" text="Edit" aria-label={`Edit ${name}`} onClick={onEdit} />
      {remove && <ConfirmButton text="Remove" ariaLabel={`Remove ${name}`} confirmText={remove.confirmText} question={remove.question} loading={remove.loading} onConfirm={remove.onConfirm} />}
    </td>
  );
}
