import { ConflictException } from '@nestjs/common';

/** A sign-off needs a locked trial and an analysis whose data still match, and happens once per person. */
export class SignOffRefusedException extends ConflictException {
  constructor(reason: 'not-locked' | 'already' | 'stale', by?: string | null, at?: Date | null) {
    super(
      reason === 'not-locked'
        ? 'Lock the trial before signing off an analysis, so its data cannot change after the sign-off.'
        : reason === 'stale'
          ? 'The trial’s data changed after this analysis was saved, so its numbers are out of date: save the analysis again and sign the new one.'
          : `This analysis was already signed off${by ? ` by ${by}` : ''}${at ? ` on ${at.toISOString().slice(0, 10)}` : ''}.`,
    );
  }
}
