import { Button } from '@blueprintjs/core';
import type { SignOff } from '@friable/contracts';
import { useState } from 'react';
import { z } from 'zod';
import { useAmendSignOff, useWithdrawSignOff } from '../api/sign-off-analysis';
import { TextAreaForm } from './text-area-form';

const statementSchema = z.object({ text: z.string().trim().min(1, 'Write your statement.').max(1000, 'A statement is at most 1000 characters.') });
const reasonSchema = z.object({ text: z.string().trim().min(1, 'Say why you withdraw it.').max(1000, 'A reason is at most 1000 characters.') });

/**
 * The signer's own actions on a standing sign-off: amend the statement (only while its data still match) or
 * withdraw it with a reason. Each sends the version shown; a change made meanwhile elsewhere comes back as a
 * sentence and the sign-off reloads as it is now.
 */
export function OwnSignOffActions({ trialId, signOff }: { trialId: number; signOff: SignOff }) {
  const amend = useAmendSignOff(trialId, signOff.analysisId, signOff.id);
  const withdraw = useWithdrawSignOff(trialId, signOff.analysisId, signOff.id);
  const [open, setOpen] = useState<'amend' | 'withdraw' | null>(null);
  if (open === 'amend') {
    return (
      <TextAreaForm
        label="Your amended statement"
        schema={statementSchema}
        initial={signOff.statement}
        submitText="Save the amended statement"
        intent="primary"
        icon="edit"
        maxLength={1000}
        rows={3}
        pending={amend.isPending}
        error={amend.error}
        onSubmit={(statement) => amend.mutate({ version: signOff.version, statement }, { onSuccess: () => setOpen(null) })}
        onCancel={() => setOpen(null)}
      />
    );
  }
  if (open === 'withdraw') {
    return (
      <TextAreaForm
        label="Why you withdraw your sign-off"
        schema={reasonSchema}
        initial=""
        submitText="Withdraw my sign-off"
        intent="danger"
        icon="undo"
        maxLength={1000}
        rows={3}
        pending={withdraw.isPending}
        error={withdraw.error}
        onSubmit={(reason) => withdraw.mutate({ version: signOff.version, reason }, { onSuccess: () => setOpen(null) })}
        onCancel={() => setOpen(null)}
      />
    );
  }
  return (
    <div className="fr-findings-actions">
      {signOff.state === 'current' && <Button variant="minimal" size="small" icon="edit" text="Amend my statement" onClick={() => setOpen('amend')} />}
      <Button variant="minimal" size="small" icon="undo" text="Withdraw my sign-off" onClick={() => setOpen('withdraw')} />
    </div>
  );
}
