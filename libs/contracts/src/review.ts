// Review of a saved analysis: requests, sign-offs and comment threads.
import type { TrialRole } from './index';

export const SIGN_OFF_STATES = ['current', 'data-changed', 'withdrawn'] as const;
/**
 * `data-changed`: the trial's data moved on after this sign-off (its data hash no longer matches);
 * `withdrawn`: its author took it back (kept on the record with the reason; it no longer counts).
 */
export type SignOffState = (typeof SIGN_OFF_STATES)[number];

export interface SignOff {
  id: number;
  analysisId: number;
  userId: number | null;
  name: string;
  role: TrialRole;
  statement: string;
  signedAt: string;
  dataHash: string;
  engineVersion: string;
  state: SignOffState;
  /** The edit version: sent back with an amendment or the withdrawal; another one answers 409 with this record. */
  version: number;
  /** When the statement was last amended by its author; null if never. */
  amendedAt: string | null;
  withdrawnAt: string | null;
  withdrawalReason: string | null;
}

/** PATCH /api/trials/:trialId/analyses/:analysisId/sign-offs/:signOffId — the author amends the statement. */
export interface SignOffAmendInput {
  version: number;
  statement: string;
}

/** DELETE /api/trials/:trialId/analyses/:analysisId/sign-offs/:signOffId — the author withdraws it, saying why. */
export interface SignOffWithdrawInput {
  version: number;
  reason: string;
}

/** POST /api/trials/:trialId/analyses/:analysisId/sign-offs. */
export interface SignOffInput {
  statement: string;
}

/** Who is expected to sign a saved analysis, and how far they are. */
export interface ReviewStatus {
  /** The trial's reviewers, or its investigators when it has no reviewer. */
  expectedRole: 'reviewer' | 'investigator';
  expected: number;
  signed: number;
  /** E.g. "Awaiting 2 reviewers" or "Signed by 1 of 2 reviewers". */
  label: string;
  /** Names of expected signers who have not signed yet. */
  awaiting: string[];
  lastRequestedAt: string | null;
}

/** POST /api/trials/:trialId/analyses/:analysisId/review-requests. */
export interface ReviewRequestInput {
  message?: string | null;
}

export interface ReviewRequestAnswer {
  /** The reviewers who were e-mailed. */
  notified: string[];
  requestedAt: string;
}

/** POST /api/trials/:trialId/analyses/:analysisId/comments body; `parentId` makes it a reply. */
export interface CommentInput {
  body: string;
  parentId?: number | null;
}

/** PATCH /api/trials/:trialId/analyses/:analysisId/comments/:commentId. */
export interface CommentUpdateInput {
  /** The comment's version as read; another one answers 409 with the comment as it is now. */
  version: number;
  body?: string;
  resolved?: boolean;
}

/** DELETE /api/trials/:trialId/analyses/:analysisId/comments/:commentId. */
export interface CommentDeleteInput {
  version: number;
}

export interface CommentRevision {
  kind: 'edited' | 'deleted';
  /** The text as it was before this change. */
  body: string;
  at: string;
  byName: string | null;
}

/** A saved analysis in the printable report: its sign-offs with their states, and the comments still open. */
export interface ReportReview {
  analysisId: number;
  title: string;
  measureName: string;
  roundLabel: string;
  scopeLabel: string;
  review: ReviewStatus;
  signOffs: SignOff[];
  /** Top-level comments neither resolved nor deleted, oldest first, with how many replies each has. */
  openComments: Array<{ id: number; authorName: string | null; body: string; createdAt: string; replyCount: number }>;
}

/** PATCH /api/trials/:trialId: unlocking a trial whose analyses are signed off needs a reason. */
export interface UnlockReason {
  reason?: string | null;
}
