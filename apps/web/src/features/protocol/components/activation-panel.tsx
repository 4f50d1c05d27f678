import { Alert, Button, Callout } from '@blueprintjs/core';
import { useState } from 'react';
import type { TrialDetail, TrialUpdateInput } from '@friable/contracts';
import { ApiError } from '../../../lib/api-client';
import { useVersionedForm } from '../../../lib/edit-conflict';
import { useUpdateTrial } from '../api/update-trial';
import { VersionConflict } from './version-conflict';

/**
 * Activation: a draft trial becomes active (collaborators may record data) once every check passes.
 * The checks come with the trial; a refusal from the server lists its own problems too. Activating a trial
 * someone else saved since the page read it shows the edit conflict dialog, as any edit of the trial does.
 * Activating asks once, saying what changes with it.
 */
export function ActivationPanel({ trial, canEdit }: { trial: TrialDetail; canEdit: boolean }) {
  const update = useUpdateTrial(trial.id);
  const [asking, setAsking] = useState(false);
  const activation = useVersionedForm<{ status: 'active' }, TrialDetail, TrialUpdateInput>(update, (mine, version) => ({ ...mine, version: version ?? trial.version }), trial, () => undefined);
  if (trial.status !== 'draft') return null;
  const refusal = update.error instanceof ApiError ? update.error : null;
  const problems = refusal?.details?.length ? refusal.details.map((d) => d.message) : trial.activation.problems;
  const ready = trial.activation.ready && !refusal;
  return (
    <Callout intent={ready ? 'success' : 'primary'} icon={ready ? 'tick-circle' : 'clipboard'} className="fr-activation" title={ready ? 'Ready to activate' : 'Draft: not ready to activate yet'}>
      {ready ? (
        <p>Every check passes. Activating lets collaborators record data at their sites.</p>
      ) : (
        <>
          <p>{refusal ? refusal.message : 'Before the trial can start, these need attention:'}</p>
          <ul className="fr-activation__problems" aria-label="What stops activation">
            {problems.map((problem) => (
              <li key={problem}>{problem}</li>
            ))}
          </ul>
        </>
      )}
      {trial.activation.warnings.length > 0 && (
        <>
          <p className="fr-activation__warnings-title">Worth reading before the trial starts (these do not stop it):</p>
          <ul className="fr-activation__warnings" aria-label="Design warnings">
            {trial.activation.warnings.map((warning) => (
              <li key={warning}>{warning}</li>
            ))}
          </ul>
        </>
      )}
      {canEdit && (
        <Button
          intent={ready ? 'success' : 'none'}
          icon="play"
          text="Activate trial"
          loading={update.isPending}
          onClick={() => setAsking(true)}
        />
      )}
      <Alert
        isOpen={asking}
        intent="success"
        icon="play"
        confirmButtonText="Activate now"
        cancelButtonText="Cancel"
        onCancel={() => setAsking(false)}
        onConfirm={() => {
          setAsking(false);
          activation.send({ status: 'active' });
        }}
      >
        <p>
          Activate trial {trial.code}? Collaborators can then record values at their sites. Once values are recorded, layouts cannot be cleared (no
          re-randomizing, no treatment added or removed), and removing a measure or round archives its values.
        </p>
      </Alert>
      <VersionConflict what={`trial ${trial.code}`} conflict={activation.conflict} onKeepMine={activation.keepMine} onTakeStored={activation.takeStored} />
    </Callout>
  );
}
