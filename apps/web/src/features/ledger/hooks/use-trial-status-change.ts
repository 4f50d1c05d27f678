import type { TrialDetail } from '@friable/contracts';
import { useVersionedForm } from '../../../lib/edit-conflict';
import { useSetTrialStatus, type TrialStatusChange } from '../api/set-trial-status';

/** What the person chose: lock, or unlock with a reason. */
export type StatusChoice = Omit<TrialStatusChange, 'version'>;

/**
 * Locking or unlocking the trial as an edit of a versioned record: sent with the version the page shows; when
 * someone else saved the trial first, `conflict` holds the choice and the trial as stored now until the person
 * keeps their choice (sent again with the stored version) or leaves the trial as it is.
 */
export function useTrialStatusChange(trial: TrialDetail, onDone: () => void = () => undefined) {
  const mutation = useSetTrialStatus(trial.id);
  const form = useVersionedForm<StatusChoice, TrialDetail, TrialStatusChange>(mutation, (choice, version) => ({ ...choice, version: version ?? trial.version }), trial, onDone);
  return { mutation, ...form };
}
