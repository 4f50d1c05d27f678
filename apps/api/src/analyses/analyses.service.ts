import type { AnalysisSnapshot, AnalysisSnapshotSummary, FindingsChoices, Findings, SnapshotComment } from '@friable/contracts';
import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { ActivityService } from '../activity/activity.service';
import type { AuthUser } from '../auth/auth-user';
import { FindingsService } from '../findings/findings.service';
import { Trial } from '../trials/models/trial.model';
import { User } from '../users/models/user.model';
import type { CreateAnalysisDto } from './dto/create-analysis.dto';
import { AnalysisSnapshotRow } from './models/analysis-snapshot.model';
import { SnapshotCommentRow } from './models/snapshot-comment.model';
import { SignOffRefusedException } from './sign-off-refused.exception';

/** The people a saved analysis names: who saved it and who signed it off. */
const people = () => [
  { model: User, as: 'creator', attributes: ['id', 'name'] },
  { model: User, as: 'signer', attributes: ['id', 'name'] },
];

function presentComment(row: SnapshotCommentRow): SnapshotComment {
  return { id: row.id, analysisId: row.snapshotId, body: row.body, authorId: row.authorId, authorName: row.author?.name ?? null, createdAt: row.createdAt.toISOString() };
}

/**
 * Saved analyses — "Save this analysis" freezes the choices, the data hash, the engine version and the full
 * Findings; reopening shows the stored numbers with `dataChanged` when today's data hash differs. Comments and
 * the investigator's sign-off (locked trials only) go to the activity log in the same transaction.
 * Throws: 404 for an analysis not in the trial, 409 SignOffRefusedException, 422 from Findings.
 */
@Injectable()
export class AnalysesService {
  constructor(
    @InjectModel(AnalysisSnapshotRow) private readonly snapshots: typeof AnalysisSnapshotRow,
    @InjectModel(SnapshotCommentRow) private readonly comments: typeof SnapshotCommentRow,
    @InjectModel(Trial) private readonly trials: typeof Trial,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly findings: FindingsService,
    private readonly activity: ActivityService,
  ) {}

  async create(trialId: number, user: AuthUser, input: CreateAnalysisDto): Promise<AnalysisSnapshot> {
    const { title, ...query } = input;
    const result = await this.findings.anovaFindings(trialId, query);
    const id = await this.sequelize.transaction(async (transaction) => {
      const row = await this.snapshots.create(
        {
          trialId,
          title: title.trim(),
          measureName: result.context.measure.name,
          roundLabel: result.context.round.label,
          scopeLabel: result.context.scope.label,
          choices: JSON.stringify(result.context.choices),
          dataHash: result.context.dataHash,
          engineVersion: result.context.engineVersion,
          result: JSON.stringify(result),
          createdById: user.id,
        },
        { transaction },
      );
      await this.activity.record(transaction, {
        trialId,
        userId: user.id,
        kind: 'analysis.saved',
        summary: `Saved the analysis "${row.title}" (${row.measureName}, ${row.roundLabel}, ${row.scopeLabel}).`,
        details: { analysisId: row.id, dataHash: row.dataHash, engineVersion: row.engineVersion },
      });
      return row.id;
    });
    return this.get(trialId, id);
  }

  async list(trialId: number): Promise<AnalysisSnapshotSummary[]> {
    const rows = await this.snapshots.findAll({
      where: { trialId },
      attributes: { exclude: ['result'] },
      include: people(),
      order: [['id', 'DESC']],
    });
    const counts = await this.commentCounts(rows.map((r) => r.id));
    return rows.map((row) => this.summary(row, counts.get(row.id) ?? 0));
  }

  async get(trialId: number, analysisId: number): Promise<AnalysisSnapshot> {
    const row = await this.find(trialId, analysisId);
    const counts = await this.commentCounts([row.id]);
    const choices = JSON.parse(row.choices) as FindingsChoices;
    let currentDataHash: string | null;
    try {
      currentDataHash = await this.findings.currentDataHash(trialId, choices);
    } catch {
      currentDataHash = null;
    }
    return { ...this.summary(row, counts.get(row.id) ?? 0), result: JSON.parse(row.result) as Findings, dataChanged: currentDataHash !== row.dataHash, currentDataHash };
  }

  /** Every saved analysis with its stored result (the workbook export). */
  async all(trialId: number): Promise<Array<AnalysisSnapshotSummary & { result: Findings }>> {
    const rows = await this.snapshots.findAll({ where: { trialId }, include: people(), order: [['id', 'ASC']] });
    const counts = await this.commentCounts(rows.map((r) => r.id));
    return rows.map((row) => ({ ...this.summary(row, counts.get(row.id) ?? 0), result: JSON.parse(row.result) as Findings }));
  }

  async listComments(trialId: number, analysisId: number): Promise<SnapshotComment[]> {
    const snapshot = await this.find(trialId, analysisId);
    const rows = await this.comments.findAll({ where: { snapshotId: snapshot.id }, include: [{ model: User, as: 'author', attributes: ['id', 'name'] }], order: [['id', 'ASC']] });
    return rows.map(presentComment);
  }

  async comment(trialId: number, analysisId: number, user: AuthUser, body: string): Promise<SnapshotComment> {
    const snapshot = await this.find(trialId, analysisId);
    const id = await this.sequelize.transaction(async (transaction) => {
      const row = await this.comments.create({ trialId, snapshotId: snapshot.id, body: body.trim(), authorId: user.id }, { transaction });
      await this.activity.record(transaction, {
        trialId,
        userId: user.id,
        kind: 'analysis.commented',
        summary: `Commented on the analysis "${snapshot.title}".`,
        details: { analysisId: snapshot.id, commentId: row.id, body: row.body.slice(0, 1000) },
      });
      return row.id;
    });
    return presentComment((await this.comments.findByPk(id, { include: [{ model: User, as: 'author', attributes: ['id', 'name'] }] }))!);
  }

  async signOff(trialId: number, analysisId: number, user: AuthUser): Promise<AnalysisSnapshot> {
    await this.sequelize.transaction(async (transaction) => {
      const trial = await this.trials.findByPk(trialId, { transaction, lock: transaction.LOCK.UPDATE });
      const snapshot = await this.snapshots.findOne({ where: { id: analysisId, trialId }, include: [{ model: User, as: 'signer', attributes: ['id', 'name'] }], transaction, lock: true });
      if (!snapshot) throw new NotFoundException('No such saved analysis in this trial.');
      if (snapshot.signedOffAt) throw new SignOffRefusedException('already', snapshot.signer?.name, snapshot.signedOffAt);
      if (trial?.status !== 'locked') throw new SignOffRefusedException('not-locked');
      snapshot.signedOffAt = new Date();
      snapshot.signedOffById = user.id;
      await snapshot.save({ transaction });
      await this.activity.record(transaction, {
        trialId,
        userId: user.id,
        kind: 'analysis.signed-off',
        summary: `Signed off the analysis "${snapshot.title}".`,
        details: { analysisId: snapshot.id, dataHash: snapshot.dataHash },
      });
    });
    return this.get(trialId, analysisId);
  }

  private async find(trialId: number, analysisId: number): Promise<AnalysisSnapshotRow> {
    const row = await this.snapshots.findOne({
      where: { id: analysisId, trialId },
      include: people(),
    });
    if (!row) throw new NotFoundException('No such saved analysis in this trial.');
    return row;
  }

  private async commentCounts(ids: number[]): Promise<Map<number, number>> {
    if (ids.length === 0) return new Map();
    const rows = (await this.comments.count({ where: { snapshotId: ids }, group: ['snapshot_id'] })) as unknown as Array<{ snapshot_id?: number; snapshotId?: number; count: number }>;
    return new Map(rows.map((r) => [Number(r.snapshotId ?? r.snapshot_id), Number(r.count)]));
  }

  private summary(row: AnalysisSnapshotRow, commentCount: number): AnalysisSnapshotSummary {
    return {
      id: row.id,
      trialId: row.trialId,
      title: row.title,
      choices: JSON.parse(row.choices) as FindingsChoices,
      measureName: row.measureName,
      roundLabel: row.roundLabel,
      scopeLabel: row.scopeLabel,
      dataHash: row.dataHash,
      engineVersion: row.engineVersion,
      createdById: row.createdById,
      createdBy: row.creator?.name ?? null,
      createdAt: row.createdAt.toISOString(),
      signedOffAt: row.signedOffAt ? row.signedOffAt.toISOString() : null,
      signedOffById: row.signedOffById,
      signedOffBy: row.signer?.name ?? null,
      commentCount,
    };
  }
}
