import { GoneException } from '@nestjs/common';

/** The invitation link was real but can no longer be used: accepted already, withdrawn, or expired. */
export class InvitationGoneException extends GoneException {
  constructor(reason: 'accepted' | 'revoked' | 'expired', expiresAt: Date) {
    super(
      reason === 'accepted'
        ? 'This invitation has already been used. Sign in to open the trial.'
        : reason === 'revoked'
          ? 'This invitation was withdrawn by the investigator. Ask them for a new one if you still expect to join.'
          : `This invitation expired on ${expiresAt.toISOString().slice(0, 10)}. Ask the investigator to send it again.`,
    );
  }
}
