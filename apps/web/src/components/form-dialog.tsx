import { Button, Dialog, DialogBody, DialogFooter, type IconName } from '@blueprintjs/core';
import type { FormEvent, ReactNode } from 'react';
import { FormErrorCallout } from './field-errors';

/**
 * A dialog holding one form: fields, then the server's complaint (for what no field shows), then
 * Cancel and the action. The form is sent with Enter or the action button.
 */
export function FormDialog({
  title,
  icon,
  wide,
  isOpen = true,
  onClose,
  onSubmit,
  submitText,
  submitIcon,
  pending,
  error,
  shownFields,
  children,
}: {
  title: string;
  icon: IconName;
  wide?: boolean;
  isOpen?: boolean;
  onClose: () => void;
  onSubmit: () => void;
  submitText: string;
  submitIcon?: IconName;
  pending: boolean;
  error: unknown;
  shownFields: string[];
  children: ReactNode;
}) {
  function submit(event: FormEvent) {
    event.preventDefault();
    onSubmit();
  }
  return (
    <Dialog isOpen={isOpen} onClose={onClose} title={title} icon={icon} className={wide ? 'fr-dialog fr-dialog--wide' : 'fr-dialog'}>
      <form onSubmit={submit} noValidate>
        <DialogBody>
          {children}
          <FormErrorCallout error={error} shownFields={shownFields} />
        </DialogBody>
        <DialogFooter
          actions={
            <>
              <Button text="Cancel" variant="minimal" onClick={onClose} />
              <Button type="submit" intent="primary" icon={submitIcon} text={submitText} loading={pending} />
            </>
          }
        />
      </form>
    </Dialog>
  );
}
