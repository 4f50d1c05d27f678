import { ConflictException } from '@nestjs/common';

/** A sign-off needs a locked trial, and happens once. */
export class SignOffRefusedException extends ConflictException {
  constructor(reason: 'not-locked' | 'already', by?: string | null, at?: Date | null) {
    super(
      reason === 'not-locked'
        ? 'Lock the trial before signing off an analysis, so its data cannot change after the sign-off.'
        : `This analysis was already signed off${by ? ` by ${by}` : ''}${at ? ` on ${at.toISOString().slice(0, 10)}` : ''}.`,
    );
  }
}
