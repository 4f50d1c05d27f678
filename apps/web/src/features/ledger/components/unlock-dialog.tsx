import { Button, TextArea } from '@blueprintjs/core';
import { useState } from 'react';
import { Field } from '../../../components/field-errors';
import { FormDialog } from '../../../components/form-dialog';
import type { TrialDetail } from '@friable/contracts';
import { useTrialStatusChange } from '../hooks/use-trial-status-change';
import { StatusConflict } from './status-conflict';

/**
 * "Unlock the trial", with the reason kept in the activity trail. The reason is required when saved
 * analyses are signed off (the server says so); those sign-offs then show "data changed after sign-off"
 * once a value changes.
 */
export function UnlockButton({ trial }: { trial: TrialDetail }) {
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState('');
  const unlock = useTrialStatusChange(trial, () => setOpen(false));
  const lock = unlock.mutation;
  return (
    <>
      <Button icon="unlock" text="Unlock the trial" loading={lock.isPending} onClick={() => setOpen(true)} />
      <StatusConflict conflict={unlock.conflict} onKeepMine={unlock.keepMine} onTakeStored={unlock.takeStored} />
      <FormDialog
        isOpen={open}
        title="Unlock the trial"
        icon="unlock"
        onClose={() => setOpen(false)}
        onSubmit={() => unlock.send({ status: 'active', reason: reason.trim() })}
        submitText="Unlock"
        pending={lock.isPending}
        error={lock.error}
        shownFields={['reason']}
      >
        <p>
          Values and the protocol can change again once the trial is unlocked. Signed-off analyses keep their sign-offs, but each shows <strong>Data changed after sign-off</strong> once
          its data change, in the Findings and in the report.
        </p>
        <Field label="Why unlock? (kept in the activity trail; required when analyses are signed off)" field="reason" error={lock.error}>
          <TextArea id="fr-field-reason" value={reason} onChange={(e) => setReason(e.target.value)} fill rows={3} maxLength={500} />
        </Field>
      </FormDialog>
    </>
  );
}
