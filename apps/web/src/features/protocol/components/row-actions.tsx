import { Button } from '@blueprintjs/core';
import { ConfirmButton } from '../../../components/confirm-button';

/** Remove after a clear question, or (`ask`) after the caller's own confirmation, such as the layout-impact one. */
type RemoveAction = { confirmText: string; question: string; loading?: boolean; onConfirm: () => void } | { ask: () => void; loading?: boolean };

/** The Edit and Remove buttons at the end of a protocol table's row (Remove left out where removing is not offered). */
export function RowActions({ name, onEdit, remove }: { name: string; onEdit: () => void; remove?: RemoveAction }) {
  return (
    <td className="fr-actions">
      <Button variant="minimal" size="small" icon="edit" text="Edit" aria-label={`Edit ${name}`} onClick={onEdit} />
      {remove && 'ask' in remove && <Button variant="minimal" size="small" intent="danger" text="Remove" aria-label={`Remove ${name}`} loading={remove.loading} onClick={remove.ask} />}
      {remove && !('ask' in remove) && <ConfirmButton text="Remove" ariaLabel={`Remove ${name}`} confirmText={remove.confirmText} question={remove.question} loading={remove.loading} onConfirm={remove.onConfirm} />}
    </td>
  );
}
