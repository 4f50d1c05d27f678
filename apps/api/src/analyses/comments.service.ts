import type { SnapshotComment } from '@friable/contracts';
import { ConflictException, ForbiddenException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { ActivityService } from '../activity/activity.service';
import type { AuthUser, TrialAccessContext } from '../common/auth-user';
import { FieldProblemsException } from '../common/exceptions/field-problems.exception';
import { mailConfig } from '../config/mail.config';
import { MailService } from '../mail/mail.service';
import { noticeEmail } from '../mail/notice-email';
import { Trial } from '../trials/models/trial.model';
import { User } from '../users/models/user.model';
import type { CommentInputDto, CommentUpdateDto } from './dto/review.dto';
import { AnalysisSnapshotRow } from './models/analysis-snapshot.model';
import { SnapshotCommentRevisionRow } from './models/snapshot-comment-revision.model';
import { SnapshotCommentRow } from './models/snapshot-comment.model';
import { refuseStaleEdit } from '../protocol-gate/edit-version';
import { TrialMemberGuard } from '../protocol-gate/trial-member-guard.service';

const withPeople = () => [
  { model: User, as: 'author', attributes: ['id', 'name', 'email'] },
  { model: User, as: 'resolver', attributes: ['id', 'name'] },
  { model: SnapshotCommentRevisionRow, include: [{ model: User, as: 'changer', attributes: ['id', 'name'] }] },
];

function present(row: SnapshotCommentRow): SnapshotComment {
  const revisions = [...(row.revisions ?? [])].sort((a, b) => a.id - b.id);
  return {
    id: row.id,
    analysisId: row.snapshotId,
    parentId: row.parentId,
    body: row.deletedAt ? '' : row.body,
    authorId: row.authorId,
    authorName: row.author?.name ?? null,
    createdAt: row.createdAt.toISOString(),
    editedAt: row.editedAt ? row.editedAt.toISOString() : null,
    deletedAt: row.deletedAt ? row.deletedAt.toISOString() : null,
    resolvedAt: row.resolvedAt ? row.resolvedAt.toISOString() : null,
    resolvedByName: row.resolver?.name ?? null,
    revisions: revisions.map((r) => ({ kind: r.kind, body: r.body, at: r.createdAt.toISOString(), byName: r.changer?.name ?? null })),
    version: row.version,
  };
}

const excerpt = (text: string) => (text.length > 200 ? `${text.slice(0, 199)}…` : text);

/**
 * Comment threads on a saved analysis — any member comments or replies (one level: a reply to a reply joins
 * its thread), authors edit and delete their own (the earlier text kept as a revision "edited" or "deleted"),
 * the author, investigators and reviewers mark a thread resolved. Replies are e-mailed to the trial's
 * reviewers and the thread's author. Every change goes to the activity trail in its transaction.
 * Throws: 404 for a comment not on the analysis, 403 for someone else's comment, 409 for a deleted one.
 */
@Injectable()
export class CommentsService {
  constructor(
    @InjectModel(SnapshotCommentRow) private readonly comments: typeof SnapshotCommentRow,
    @InjectModel(SnapshotCommentRevisionRow) private readonly revisions: typeof SnapshotCommentRevisionRow,
    @InjectModel(AnalysisSnapshotRow) private readonly snapshots: typeof AnalysisSnapshotRow,
    @InjectModel(Trial) private readonly trials: typeof Trial,
    @InjectConnection() private readonly sequelize: Sequelize,
    @Inject(mailConfig.KEY) private readonly mailSettings: ConfigType<typeof mailConfig>,
    private readonly activity: ActivityService,
    private readonly mail: MailService,
    private readonly members: TrialMemberGuard,
  ) {}

  /** Every comment of the analysis, oldest first (replies carry parentId). */
  async list(trialId: number, analysisId: number): Promise<SnapshotComment[]> {
    const snapshot = await this.snapshot(trialId, analysisId);
    const rows = await this.comments.findAll({ where: { snapshotId: snapshot.id }, include: withPeople(), order: [['id', 'ASC']] });
    return rows.map(present);
  }

  /** Comments of many analyses (the report), oldest first. */
  async forSnapshots(ids: number[]): Promise<SnapshotComment[]> {
    if (ids.length === 0) return [];
    const rows = await this.comments.findAll({ where: { snapshotId: ids }, include: withPeople(), order: [['id', 'ASC']] });
    return rows.map(present);
  }

  async add(trialId: number, analysisId: number, user: AuthUser, input: CommentInputDto): Promise<SnapshotComment> {
    const snapshot = await this.snapshot(trialId, analysisId);
    let root: SnapshotCommentRow | null = null;
    if (input.parentId != null) {
      const parent = await this.comments.findOne({ where: { id: input.parentId, snapshotId: snapshot.id }, include: withPeople() });
      if (!parent) throw new FieldProblemsException([{ field: 'parentId', message: 'parentId must be the id of a comment on this analysis' }]);
      root = parent.parentId === null ? parent : await this.comments.findOne({ where: { id: parent.parentId }, include: withPeople() });
      if (!root || root.deletedAt) throw new ConflictException('That comment was deleted, so it cannot be answered.');
    }
    const id = await this.sequelize.transaction(async (transaction) => {
      const row = await this.comments.create({ trialId, snapshotId: snapshot.id, body: input.body.trim(), authorId: user.id, parentId: root?.id ?? null }, { transaction });
      await this.activity.record(transaction, {
        trialId,
        userId: user.id,
        kind: root ? 'analysis.comment-replied' : 'analysis.commented',
        summary: root ? `Replied to ${root.author?.name ?? 'a comment'} on the analysis "${snapshot.title}".` : `Commented on the analysis "${snapshot.title}".`,
        details: { analysisId: snapshot.id, commentId: row.id, parentId: root?.id ?? null, body: row.body.slice(0, 1000) },
      });
      return row.id;
    });
    if (root) await this.notifyReply(trialId, snapshot, root, user, input.body.trim());
    return present((await this.comments.findByPk(id, { include: withPeople() }))!);
  }

  async update(access: TrialAccessContext, analysisId: number, commentId: number, user: AuthUser, input: CommentUpdateDto): Promise<SnapshotComment> {
    const snapshot = await this.snapshot(access.trialId, analysisId);
    await this.sequelize.transaction(async (transaction) => {
      const row = await this.comments.findOne({ where: { id: commentId, snapshotId: snapshot.id }, transaction, lock: transaction.LOCK.UPDATE });
      if (!row) throw new NotFoundException('No such comment on this analysis.');
      await this.refuseStale(row, input.version);
      if (row.deletedAt) throw new ConflictException('This comment was deleted, so it cannot be changed.');
      const changed: string[] = [];
      if (input.body !== undefined && input.body.trim() !== row.body) {
        if (row.authorId !== user.id) throw new ForbiddenException('Only its author can edit a comment.');
        await this.revisions.create({ commentId: row.id, kind: 'edited', body: row.body, changedById: user.id }, { transaction });
        row.body = input.body.trim();
        row.editedAt = new Date();
        changed.push('edited');
      }
      if (input.resolved !== undefined && input.resolved !== (row.resolvedAt !== null)) {
        if (row.authorId !== user.id) {
          this.members.requireRole(access, ['investigator', 'reviewer'], 'Only the comment’s author, the investigators and the reviewers can resolve a thread.');
        }
        row.resolvedAt = input.resolved ? new Date() : null;
        row.resolvedById = input.resolved ? user.id : null;
        changed.push(input.resolved ? 'resolved' : 'reopened');
      }
      if (changed.length === 0) return;
      row.version += 1;
      await row.save({ transaction });
      await this.activity.record(transaction, {
        trialId: access.trialId,
        userId: user.id,
        kind: 'analysis.comment-changed',
        summary: `${changed.map((c) => c[0].toUpperCase() + c.slice(1)).join(' and ')} a comment on the analysis "${snapshot.title}".`,
        details: { analysisId: snapshot.id, commentId: row.id, changed, body: row.body.slice(0, 1000) },
      });
    });
    return present((await this.comments.findByPk(commentId, { include: withPeople() }))!);
  }

  /** Deletes one's own comment: its text is emptied and kept as a revision "deleted"; replies stay. */
  async remove(trialId: number, analysisId: number, commentId: number, user: AuthUser, version: number): Promise<void> {
    const snapshot = await this.snapshot(trialId, analysisId);
    await this.sequelize.transaction(async (transaction) => {
      const row = await this.comments.findOne({ where: { id: commentId, snapshotId: snapshot.id }, transaction, lock: transaction.LOCK.UPDATE });
      if (!row) throw new NotFoundException('No such comment on this analysis.');
      if (row.authorId !== user.id) throw new ForbiddenException('Only its author can delete a comment.');
      await this.refuseStale(row, version);
      if (row.deletedAt) throw new ConflictException('This comment was already deleted.');
      await this.revisions.create({ commentId: row.id, kind: 'deleted', body: row.body, changedById: user.id }, { transaction });
      row.deletedAt = new Date();
      row.body = '';
      row.version += 1;
      await row.save({ transaction });
      await this.activity.record(transaction, {
        trialId,
        userId: user.id,
        kind: 'analysis.comment-deleted',
        summary: `Deleted a comment on the analysis "${snapshot.title}".`,
        details: { analysisId: snapshot.id, commentId: row.id },
      });
    });
  }

  private async notifyReply(trialId: number, snapshot: AnalysisSnapshotRow, root: SnapshotCommentRow, user: AuthUser, body: string): Promise<void> {
    const trial = (await this.trials.findByPk(trialId))!;
    const reviewers = await this.members.people(trialId, 'reviewer');
    const recipients = new Map(reviewers.map((r) => [r.email, r.name]));
    if (root.author) recipients.set(root.author.email, root.author.name);
    recipients.delete(user.email);
    for (const [email, name] of recipients) {
      await this.mail.sendOrLog(
        noticeEmail({
          to: email,
          subject: `New reply on "${snapshot.title}" (${trial.code})`,
          paragraphs: [
            `Hello ${name},`,
            `${user.name} replied to ${root.author?.name ?? 'a comment'} on the saved analysis "${snapshot.title}" of the trial ${trial.code}:`,
            excerpt(body),
          ],
          link: { href: `${this.mailSettings.appUrl}/trials/${trialId}/findings?analysis=${snapshot.id}`, label: 'Open the thread' },
        }),
      );
    }
  }

  /** A change made from an older copy of the comment: 409 with the comment as stored now, nothing written. */
  private async refuseStale(row: SnapshotCommentRow, version: number): Promise<void> {
    await refuseStaleEdit('this comment', row.version, version, async () => present((await this.comments.findByPk(row.id, { include: withPeople() }))!));
  }

  private async snapshot(trialId: number, analysisId: number): Promise<AnalysisSnapshotRow> {
    const row = await this.snapshots.findOne({ where: { id: analysisId, trialId } });
    if (!row) throw new NotFoundException('No such saved analysis in this trial.');
    return row;
  }
}
