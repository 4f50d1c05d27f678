// The Team part of the API: members, invitations by e-mail, the development Outbox.
import type { LoginResponse, TrialRole } from './index';

export interface Member {
  membershipId: number;
  userId: number;
  name: string;
  email: string;
  role: TrialRole;
  siteId: number | null;
  siteName: string | null;
  since: string;
}

export interface Invitation {
  id: number;
  email: string;
  role: TrialRole;
  siteId: number | null;
  siteName: string | null;
  invitedByName: string | null;
  sentAt: string;
  expiresAt: string;
  status: 'pending' | 'accepted' | 'revoked' | 'expired';
}

export interface InvitationInput {
  email: string;
  role: TrialRole;
  /** Required for collaborators. */
  siteId?: number | null;
  /** Optional personal note included in the e-mail. */
  message?: string | null;
}

/** GET /api/invitations/:token (public): what the invitation is for, before accepting. */
export interface InvitationPreview {
  trialCode: string;
  trialTitle: string;
  role: TrialRole;
  siteName: string | null;
  email: string;
  invitedByName: string | null;
  /** True when an account with this e-mail exists: the invitee joins with it instead of creating one. */
  accountExists: boolean;
  expiresAt: string;
}

/**
 * POST /api/invitations/:token/accept: new account (name + password) or existing account (password).
 * The password may be left out when the caller sends the bearer token of the invited person.
 */
export interface InvitationAcceptInput {
  name?: string;
  password?: string;
}

/** The answer to accepting: the person is signed in (201 for a new account, 200 for an existing one). */
export interface InvitationAcceptResponse extends LoginResponse {
  /** The trial just joined, so the app can open it. */
  trialId: number;
}

export interface OutboxMessage {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
}
