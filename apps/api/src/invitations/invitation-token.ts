import { hashLinkSecret, newLinkSecret } from '../common/link-secret';

/** An invitation link's secret and its hash (see common/link-secret). */
export const newInvitationToken = newLinkSecret;
export const hashInvitationToken = hashLinkSecret;
