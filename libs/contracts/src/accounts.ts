// Accounts and sessions: passwords, resets, signing out everywhere, each person's own settings.
import type { TrialRole } from './index';

/** POST /api/auth/password: change one's own password (the current one is required). */
export interface PasswordChangeInput {
  currentPassword: string;
  newPassword: string;
}

/** POST /api/auth/password-reset: the same answer whether or not an account has this address. */
export interface PasswordResetRequestInput {
  email: string;
}

/** POST /api/auth/password-reset/confirm: the secret of the e-mailed link and the new password. */
export interface PasswordResetConfirmInput {
  token: string;
  password: string;
}

/** The answer of the password and reset routes. */
export interface AccountNotice {
  message: string;
}

/** POST /api/auth/logout-all. */
export interface SessionsEnded {
  message: string;
  /** How many sessions (this one included) were ended. */
  sessionsEnded: number;
}

/** PATCH /api/users/me: what each person sets for themselves (every field optional). */
export interface MySettingsInput {
  name?: string;
  /** BCP 47 tag such as `en-GB` or `de-DE`; null or '' to follow the browser. */
  locale?: string | null;
  emailReminders?: boolean;
  emailReceipts?: boolean;
}

/** PATCH /api/users/:userId (administrator): the same fields, plus the account's state and rights. */
export interface UserUpdateInput extends MySettingsInput {
  email?: string;
  isAdmin?: boolean;
  isActive?: boolean;
}

/** PATCH /api/trials/:trialId/members/:userId: the person's role on the trial and, for a collaborator, the sites. */
export interface MemberUpdateInput {
  role: TrialRole;
  /** Required (one or more) for a collaborator; must be absent or empty for other roles. */
  siteIds?: number[];
}
