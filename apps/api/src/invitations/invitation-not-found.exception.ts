import { NotFoundException } from '@nestjs/common';

/** No invitation has this link: mistyped, or replaced by a newer e-mail when the invitation was resent. */
export class InvitationNotFoundException extends NotFoundException {
  constructor() {
    super('This invitation link is not valid. It may be mistyped, or a newer e-mail replaced it: use the link in the latest invitation.');
  }
}
