import type { Request } from 'express';
import type { TrialRole } from '@friable/contracts';

/** The signed-in person attached to each request by the JWT strategy. */
export interface AuthUser {
  id: number;
  email: string;
  name: string;
  isAdmin: boolean;
  /** The sign-in session of the request; absent for work done outside a request (the demo loader). */
  sessionId?: string;
}

export interface TrialAccessContext {
  trialId: number;
  roles: TrialRole[];
  /** Sites a collaborator is assigned to (empty for other roles). */
  siteIds: number[];
  /** True when the caller is an administrator without a role on the trial (read-only). */
  adminReadOnly: boolean;
}

export interface AuthenticatedRequest extends Request {
  user: AuthUser;
  trialAccess?: TrialAccessContext;
  /** The access stamp read for this request, shared by its session and trial-role checks (data-stamps). */
  accessStamp?: Promise<string>;
}
