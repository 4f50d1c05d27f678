// Request and response shapes of Friable's HTTP API, shared by the API and the web app.

/** The body of every error answer: a status, a sentence for people, and details per field or row. */
export interface ProblemBody {
  statusCode: number;
  error: string;
  message: string;
  errors?: Array<{ field?: string; row?: number; column?: string; message: string }>;
}

export const TRIAL_ROLES = ['investigator', 'collaborator', 'reviewer'] as const;
export type TrialRole = (typeof TRIAL_ROLES)[number];

export const TRIAL_STATUSES = ['draft', 'active', 'locked', 'archived'] as const;
export type TrialStatus = (typeof TRIAL_STATUSES)[number];

/**
 * One treatment factor: completely randomized (crd) or in complete blocks (rcbd). Factorials of 2–4 factors,
 * completely randomized or in blocks. Split plot and split-split plot, in blocks. Any of them at one site or several.
 */
export const TRIAL_DESIGNS = ['crd', 'rcbd', 'factorial-crd', 'factorial-rcbd', 'split-plot', 'split-split-plot'] as const;
export type TrialDesign = (typeof TRIAL_DESIGNS)[number];

/** What the API says about a person: never the password hash. */
export interface PublicUser {
  id: number;
  email: string;
  name: string;
  isAdmin: boolean;
  isActive: boolean;
  createdAt: string;
  /** BCP 47 tag for numbers and dates (e.g. `de-DE`, decimal comma); null means the browser's own. */
  locale: string | null;
  emailReminders: boolean;
  emailReceipts: boolean;
  /** When the person last signed in; null if never. */
  lastSignInAt: string | null;
}

export interface LoginRequest {
  email: string;
  password: string;
}

export interface LoginResponse {
  accessToken: string;
  tokenType: 'Bearer';
  /** Seconds until the token expires. */
  expiresIn: number;
  user: PublicUser;
}

export interface TrialSummary {
  id: number;
  code: string;
  title: string;
  design: TrialDesign;
  status: TrialStatus;
  /** The caller's roles on this trial (empty for an administrator without one). */
  myRoles: TrialRole[];
  updatedAt: string;
}

export interface HealthReport {
  status: 'ok' | 'unavailable';
  database: 'up' | 'down';
  message?: string;
}

export * from './protocol';
export * from './team';
export * from './intake';
export * from './findings';
export * from './models';
export * from './accounts';
export * from './review';
