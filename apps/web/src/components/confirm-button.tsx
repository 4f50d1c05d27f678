import { Alert, Button, type Intent } from '@blueprintjs/core';
import { useState, type ReactNode } from 'react';

/** A small button that asks once before doing something that cannot be undone. */
export function ConfirmButton({
  text,
  confirmText,
  question,
  onConfirm,
  loading,
  intent = 'danger',
  ariaLabel,
}: {
  text: string;
  confirmText: string;
  question: ReactNode;
  onConfirm: () => void;
  loading?: boolean;
  intent?: Intent;
  ariaLabel?: string;
}) {
  const [open, setOpen] = useState(false);
  return (
    <>
      <Button variant="minimal" size="small" intent={intent} text={text} aria-label={ariaLabel} loading={loading} onClick={() => setOpen(true)} />
      <Alert
        isOpen={open}
        intent={intent}
        confirmButtonText={confirmText}
        cancelButtonText="Cancel"
        onCancel={() => setOpen(false)}
        onConfirm={() => {
          setOpen(false);
          onConfirm();
        }}
      >
        {question}
      </Alert>
    </>
  );
}
