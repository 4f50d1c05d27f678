import type { ReviewRequestAnswer, ReviewStatus, SignOff, TrialRole } from '@friable/contracts';
import { ConflictException, ForbiddenException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { ActivityService } from '../activity/activity.service';
import type { AuthUser, TrialAccessContext } from '../common/auth-user';
import { mailConfig } from '../config/mail.config';
import { FindingsService } from '../findings/findings.service';
import { MailService } from '../mail/mail.service';
import { noticeEmail } from '../mail/notice-email';
import { Trial } from '../trials/models/trial.model';
import { AnalysisSignOffRow } from './models/analysis-sign-off.model';
import { AnalysisSnapshotRow } from './models/analysis-snapshot.model';
import { ReviewRequestRow } from './models/review-request.model';
import { SignOffRefusedException } from './sign-off-refused.exception';
import { savedChoicesOf } from './saved-choices';
import { refuseStaleEdit } from '../protocol-gate/edit-version';
import { TrialMemberGuard, type TrialMemberPerson } from '../protocol-gate/trial-member-guard.service';

/** A person expected to sign: the trial's reviewers, or its investigators when it has none. */
type Signer = TrialMemberPerson;

/** A sign-off as answered; `current` is today's data hash of its analysis (undefined: not computed). */
function presentSignOff(s: AnalysisSignOffRow, current: string | null | undefined): SignOff {
  return {
    id: s.id,
    analysisId: s.snapshotId,
    userId: s.userId,
    name: s.signerName,
    role: s.role,
    statement: s.statement,
    signedAt: s.createdAt.toISOString(),
    dataHash: s.dataHash,
    engineVersion: s.engineVersion,
    state: s.withdrawnAt ? 'withdrawn' : current !== undefined && current !== s.dataHash ? 'data-changed' : 'current',
    version: s.version,
    amendedAt: s.amendedAt ? s.amendedAt.toISOString() : null,
    withdrawnAt: s.withdrawnAt ? s.withdrawnAt.toISOString() : null,
    withdrawalReason: s.withdrawalReason,
  };
}

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

/**
 * Review status label — "Awaiting 2 reviewers", "Signed by 1 of 2 reviewers", "Signed by both reviewers"
 * style sentences for Findings and the report. Pure.
 * @example reviewLabel('reviewer', 2, 1) // → 'Signed by 1 of 2 reviewers'
 */
export function reviewLabel(role: 'reviewer' | 'investigator', expected: number, signed: number): string {
  if (expected === 0) return `No ${role} on the team yet`;
  if (signed === 0) return `Awaiting ${plural(expected, role)}`;
  if (signed >= expected) return expected === 1 ? `Signed by the ${role}` : `Signed by all ${plural(expected, role)}`;
  return `Signed by ${signed} of ${plural(expected, role)}`;
}

/**
 * Review of saved analyses — sign-offs (a reviewer, or an investigator of a trial without reviewers, with a
 * statement, on a locked trial, of an analysis whose data still match), the investigator's requests for review
 * e-mailed to the reviewers, and where each analysis stands. A sign-off is marked `data-changed` once the
 * analysis's data hash no longer matches today's data (after an unlock and a change).
 * Throws: 404 for an analysis not in the trial, 403 for a role that may not sign, 409 SignOffRefusedException.
 */
@Injectable()
export class ReviewService {
  constructor(
    @InjectModel(AnalysisSnapshotRow) private readonly snapshots: typeof AnalysisSnapshotRow,
    @InjectModel(AnalysisSignOffRow) private readonly signOffs: typeof AnalysisSignOffRow,
    @InjectModel(ReviewRequestRow) private readonly requests: typeof ReviewRequestRow,
    @InjectModel(Trial) private readonly trials: typeof Trial,
    @InjectConnection() private readonly sequelize: Sequelize,
    @Inject(mailConfig.KEY) private readonly mailSettings: ConfigType<typeof mailConfig>,
    private readonly findings: FindingsService,
    private readonly activity: ActivityService,
    private readonly mail: MailService,
    private readonly members: TrialMemberGuard,
  ) {}

  /** Sign-offs and review status of each snapshot, given the data hash of today's data for each (null: unknown). */
  async forSnapshots(trialId: number, rows: AnalysisSnapshotRow[], currentHashes: Map<number, string | null>): Promise<Map<number, { signOffs: SignOff[]; review: ReviewStatus }>> {
    const ids = rows.map((r) => r.id);
    const [signOffs, requests, expected] = await Promise.all([
      ids.length ? this.signOffs.findAll({ where: { snapshotId: ids }, order: [['id', 'ASC']] }) : Promise.resolve([]),
      ids.length ? this.requests.findAll({ where: { snapshotId: ids }, order: [['id', 'ASC']] }) : Promise.resolve([]),
      this.expectedSigners(trialId),
    ]);
    const answer = new Map<number, { signOffs: SignOff[]; review: ReviewStatus }>();
    for (const row of rows) {
      const current = currentHashes.get(row.id);
      const mine = signOffs.filter((s) => s.snapshotId === row.id).map((s) => presentSignOff(s, current));
      const signedIds = new Set(mine.filter((s) => s.state !== 'withdrawn').map((s) => s.userId));
      const signed = expected.people.filter((p) => signedIds.has(p.id)).length;
      const last = requests.filter((r) => r.snapshotId === row.id).at(-1);
      answer.set(row.id, {
        signOffs: mine,
        review: {
          expectedRole: expected.role,
          expected: expected.people.length,
          signed,
          label: reviewLabel(expected.role, expected.people.length, signed),
          awaiting: expected.people.filter((p) => !signedIds.has(p.id)).map((p) => p.name),
          lastRequestedAt: last ? last.createdAt.toISOString() : null,
        },
      });
    }
    return answer;
  }

  /** Today's data hash for the snapshot's choices; null when it cannot be computed (the protocol changed under it). */
  async currentHash(trialId: number, row: AnalysisSnapshotRow): Promise<string | null> {
    try {
      return await this.findings.currentDataHash(trialId, savedChoicesOf(row.choices));
    } catch {
      return null;
    }
  }

  async signOff(access: TrialAccessContext, analysisId: number, user: AuthUser, statement: string): Promise<SignOff> {
    const trialId = access.trialId;
    const snapshot = await this.snapshots.findOne({ where: { id: analysisId, trialId } });
    if (!snapshot) throw new NotFoundException('No such saved analysis in this trial.');
    const current = await this.currentHash(trialId, snapshot);
    const id = await this.sequelize.transaction(async (transaction) => {
      const trial = await this.trials.findByPk(trialId, { transaction, lock: transaction.LOCK.UPDATE });
      if (trial?.status !== 'locked') throw new SignOffRefusedException('not-locked');
      const role = await this.signingRole(access, transaction);
      const earlier = await this.signOffs.findOne({ where: { snapshotId: snapshot.id, userId: user.id, withdrawnAt: null }, transaction });
      if (earlier) throw new SignOffRefusedException('already', 'you', earlier.createdAt);
      if (current !== snapshot.dataHash) throw new SignOffRefusedException('stale');
      const row = await this.signOffs.create(
        { trialId, snapshotId: snapshot.id, userId: user.id, signerName: user.name, role, statement: statement.trim(), dataHash: snapshot.dataHash, engineVersion: snapshot.engineVersion },
        { transaction },
      );
      await this.activity.record(transaction, {
        trialId,
        userId: user.id,
        kind: 'analysis.signed-off',
        summary: `Signed off the analysis "${snapshot.title}" as ${role}.`,
        details: { analysisId: snapshot.id, signOffId: row.id, statement: row.statement, dataHash: row.dataHash, engineVersion: row.engineVersion },
      });
      return row.id;
    });
    const state = (await this.forSnapshots(trialId, [snapshot], new Map([[snapshot.id, current]]))).get(snapshot.id)!;
    return state.signOffs.find((s) => s.id === id)!;
  }

  /**
   * The author amends the statement of a standing sign-off (the earlier text kept in the activity trail). Only a
   * sign-off whose data still match: one marked "data changed" is withdrawn and the new analysis signed instead.
   */
  async amend(trialId: number, analysisId: number, signOffId: number, user: AuthUser, input: { version: number; statement: string }): Promise<SignOff> {
    return this.changeOwn(trialId, analysisId, signOffId, user, input.version, async (row, snapshot, current, transaction) => {
      if (row.withdrawnAt) throw new ConflictException('This sign-off was withdrawn, so its statement cannot change; sign the analysis again instead.');
      if (current !== row.dataHash) {
        throw new ConflictException('The data changed after this sign-off, so its statement cannot be amended: withdraw it, and sign the analysis saved from today’s data.');
      }
      const before = row.statement;
      const statement = input.statement.trim();
      if (statement === before) return;
      row.statement = statement;
      row.amendedAt = new Date();
      row.version += 1;
      await row.save({ transaction });
      await this.activity.record(transaction, {
        trialId,
        userId: user.id,
        kind: 'analysis.sign-off-amended',
        summary: `Amended the statement of their sign-off of the analysis "${snapshot.title}".`,
        details: { analysisId: snapshot.id, signOffId: row.id, changed: ['statement'], before: { statement: before }, after: { statement } },
      });
    });
  }

  /** The author withdraws a sign-off, saying why: kept on the record as withdrawn, it no longer counts; they may sign again. */
  async withdraw(trialId: number, analysisId: number, signOffId: number, user: AuthUser, input: { version: number; reason: string }): Promise<SignOff> {
    return this.changeOwn(trialId, analysisId, signOffId, user, input.version, async (row, snapshot, _current, transaction) => {
      if (row.withdrawnAt) throw new ConflictException('This sign-off was already withdrawn.');
      row.withdrawnAt = new Date();
      row.withdrawalReason = input.reason.trim();
      row.version += 1;
      await row.save({ transaction });
      await this.activity.record(transaction, {
        trialId,
        userId: user.id,
        kind: 'analysis.sign-off-withdrawn',
        summary: `Withdrew their sign-off of the analysis "${snapshot.title}".`,
        details: { analysisId: snapshot.id, signOffId: row.id, reason: row.withdrawalReason, statement: row.statement, dataHash: row.dataHash },
      });
    });
  }

  /** Locks one's own sign-off, refuses another person's (403) and a stale version (409 with the sign-off as stored), then applies the change. */
  private async changeOwn(
    trialId: number,
    analysisId: number,
    signOffId: number,
    user: AuthUser,
    version: number,
    change: (row: AnalysisSignOffRow, snapshot: AnalysisSnapshotRow, current: string | null, transaction: Transaction) => Promise<void>,
  ): Promise<SignOff> {
    const snapshot = await this.snapshots.findOne({ where: { id: analysisId, trialId } });
    if (!snapshot) throw new NotFoundException('No such saved analysis in this trial.');
    const current = await this.currentHash(trialId, snapshot);
    await this.sequelize.transaction(async (transaction) => {
      const row = await this.signOffs.findOne({ where: { id: signOffId, snapshotId: snapshot.id }, transaction, lock: transaction.LOCK.UPDATE });
      if (!row) throw new NotFoundException('No such sign-off on this analysis.');
      if (row.userId !== user.id) throw new ForbiddenException('Only the person who signed can amend or withdraw a sign-off.');
      await refuseStaleEdit(`the sign-off by ${row.signerName}`, row.version, version, () => presentSignOff(row, current));
      await change(row, snapshot, current, transaction);
    });
    const row = (await this.signOffs.findByPk(signOffId))!;
    return presentSignOff(row, current);
  }

  /** E-mails each reviewer of the trial a link to the saved analysis. */
  async requestReview(trialId: number, analysisId: number, user: AuthUser, message: string | null | undefined): Promise<ReviewRequestAnswer> {
    const snapshot = await this.snapshots.findOne({ where: { id: analysisId, trialId } });
    if (!snapshot) throw new NotFoundException('No such saved analysis in this trial.');
    const trial = (await this.trials.findByPk(trialId))!;
    const reviewers = await this.people(trialId, 'reviewer');
    if (reviewers.length === 0) throw new ConflictException('This trial has no reviewer yet: invite one on the Team page, then ask for review.');
    const note = message?.trim() || null;
    const row = await this.sequelize.transaction(async (transaction) => {
      const created = await this.requests.create({ trialId, snapshotId: snapshot.id, requestedById: user.id, message: note }, { transaction });
      await this.activity.record(transaction, {
        trialId,
        userId: user.id,
        kind: 'analysis.review-requested',
        summary: `Asked ${reviewers.map((r) => r.name).join(', ')} to review the analysis "${snapshot.title}".`,
        details: { analysisId: snapshot.id, reviewerIds: reviewers.map((r) => r.id), message: note },
      });
      return created;
    });
    const link = { href: `${this.mailSettings.appUrl}/trials/${trialId}/findings?analysis=${snapshot.id}`, label: 'Open the analysis' };
    const notified: string[] = [];
    for (const reviewer of reviewers) {
      const sent = await this.mail.sendOrLog(
        noticeEmail({
          to: reviewer.email,
          subject: `Review requested: ${snapshot.title} (${trial.code})`,
          paragraphs: [
            `Hello ${reviewer.name},`,
            `${user.name} asks you to review the saved analysis "${snapshot.title}" (${snapshot.measureName}, ${snapshot.roundLabel}, ${snapshot.scopeLabel}) of the trial "${trial.title}" (${trial.code}).`,
            ...(note ? [`${user.name} writes:\n${note}`] : []),
            'Open it to read the numbers, comment, and — once the trial is locked — sign it off with a short statement.',
          ],
          link,
        }),
      );
      if (sent) notified.push(reviewer.name);
    }
    return { notified, requestedAt: row.createdAt.toISOString() };
  }

  /** The people holding a role on the trial, one entry each, by name (the trial member guard's answer). */
  people(trialId: number, role: TrialRole, transaction?: Transaction): Promise<Signer[]> {
    return this.members.people(trialId, role, transaction);
  }

  private async expectedSigners(trialId: number): Promise<{ role: 'reviewer' | 'investigator'; people: Signer[] }> {
    const reviewers = await this.people(trialId, 'reviewer');
    return reviewers.length ? { role: 'reviewer', people: reviewers } : { role: 'investigator', people: await this.people(trialId, 'investigator') };
  }

  private async signingRole(access: TrialAccessContext, transaction: Transaction): Promise<'reviewer' | 'investigator'> {
    this.members.requireRole(access, ['reviewer', 'investigator'], 'Only the trial’s reviewers (or its investigator, when it has no reviewer) can sign off an analysis.');
    if (this.members.holds(access, ['reviewer'])) return 'reviewer';
    if ((await this.members.countPeople(access.trialId, 'reviewer', transaction)) === 0) return 'investigator';
    throw new ForbiddenException('This trial has reviewers, so they sign off its analyses; an investigator signs only when a trial has no reviewer.');
  }
}
