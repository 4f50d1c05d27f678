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
