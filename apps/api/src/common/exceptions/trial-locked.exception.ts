import { ConflictException } from '@nestjs/common';

/** A locked (or archived) trial refuses every protocol write until it is unlocked. */
export class TrialLockedException extends ConflictException {
  constructor(status: 'locked' | 'archived' = 'locked') {
    super(
      status === 'locked'
        ? 'This trial is locked; unlock it to change anything.'
        : 'This trial is archived; an archived trial can no longer be changed.',
    );
  }
}

/** Throws TrialLockedException when the trial is locked or archived; every write path asks this one question. */
export function refuseIfClosed(trial: { status: string }): void {
  if (trial.status === 'locked' || trial.status === 'archived') throw new TrialLockedException(trial.status);
}
