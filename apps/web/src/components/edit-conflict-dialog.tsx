import { Button, Dialog, DialogBody, DialogFooter } from '@blueprintjs/core';
import type { ReactNode } from 'react';

export interface ConflictRow {
  label: string;
  mine: ReactNode;
  stored: ReactNode;
}

/**
 * Someone else saved the same record first: nothing was overwritten; each differing value is shown as the
 * person entered it and as it is stored now, and the person chooses which stays.
 */
export function EditConflictDialog({
  title,
  intro,
  rows,
  takeText = 'Take the stored values',
  labelled = rows.length > 1,
  onKeepMine,
  onTakeStored,
}: {
  title: string;
  intro: ReactNode;
  rows: ConflictRow[];
  takeText?: string;
  /** Name each field above its pair (always for more than one). */
  labelled?: boolean;
  onKeepMine: () => void;
  onTakeStored: () => void;
}) {
  return (
    <Dialog isOpen title={title} icon="swap-horizontal" onClose={onTakeStored} className="fr-dialog">
      <DialogBody>
        <p>{intro} Nothing was overwritten; choose which stays.</p>
        <dl className="fr-ledger-conflict">
          {rows.map((row) => (
            <div key={row.label} className="fr-ledger-conflict__pair" role="group" aria-label={row.label}>
              {labelled && <dt className="fr-ledger-conflict__field">{row.label}</dt>}
              <dt>Yours</dt>
              <dd className="fr-ledger-conflict__value">{row.mine}</dd>
              <dt>Stored now</dt>
              <dd className="fr-ledger-conflict__value">{row.stored}</dd>
            </div>
          ))}
        </dl>
      </DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text={takeText} onClick={onTakeStored} />
            <Button intent="primary" text="Keep mine" onClick={onKeepMine} />
          </>
        }
      />
    </Dialog>
  );
}

/** A field's value in words for the comparison: empty, yes/no, a list, or a number or text as it is. */
export function conflictText(value: unknown): string {
  if (value === null || value === undefined || value === '') return '(empty)';
  if (typeof value === 'boolean') return value ? 'Yes' : 'No';
  if (Array.isArray(value)) return value.map((item) => (typeof item === 'object' && item !== null && 'name' in item ? String(item.name) : conflictText(item))).join(', ') || '(none)';
  if (typeof value === 'object') return JSON.stringify(value);
  return String(value);
}

/** The rows of the fields whose value the person sent differs from the stored one, labelled for people. */
export function conflictRows<T extends object>(mine: Partial<T>, stored: T, labels: Partial<Record<keyof T, string>>): ConflictRow[] {
  return (Object.keys(mine) as Array<keyof T>)
    .filter((key) => key !== 'version' && key in stored && JSON.stringify(mine[key]) !== JSON.stringify(stored[key]))
    .map((key) => ({ label: labels[key] ?? String(key), mine: conflictText(mine[key]), stored: conflictText(stored[key]) }));
}
