import type { AnalysisSnapshot, AnalysisSnapshotSummary, FindingsAnswer, ReviewStatus, SignOff } from '@friable/contracts';
import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { ActivityService } from '../activity/activity.service';
import type { AuthUser } from '../common/auth-user';
import { FindingsCache } from '../findings/findings-cache';
import { FindingsService } from '../findings/findings.service';
import { analysisLabel, savedChoicesFor, savedChoicesOf } from './saved-choices';
import { User } from '../users/models/user.model';
import type { CreateAnalysisDto } from './dto/create-analysis.dto';
import { AnalysisSnapshotRow } from './models/analysis-snapshot.model';
import { SnapshotCommentRow } from './models/snapshot-comment.model';
import { AnalysisSignOffRow } from './models/analysis-sign-off.model';
import { ReviewService } from './review.service';

/** The person a saved analysis names: who saved it. */
const people = () => [{ model: User, as: 'creator', attributes: ['id', 'name'] }];

type Review = { signOffs: SignOff[]; review: ReviewStatus };


/**
 * Saved analyses — "Save this analysis" freezes the choices (the analysis and its model options included), the data
 * hash, the engine version and the full Findings answer of any analysis Findings offers; reopening shows the stored numbers with `dataChanged` when today's data hash differs. Each carries its
 * sign-offs and review status (ReviewService); comments live in CommentsService.
 * Throws: 404 for an analysis not in the trial, 422 from Findings.
 */
@Injectable()
export class AnalysesService {
  constructor(
    @InjectModel(AnalysisSnapshotRow) private readonly snapshots: typeof AnalysisSnapshotRow,
    @InjectModel(SnapshotCommentRow) private readonly comments: typeof SnapshotCommentRow,
    @InjectModel(AnalysisSignOffRow) private readonly signOffs: typeof AnalysisSignOffRow,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly findings: FindingsService,
    private readonly cache: FindingsCache,
    private readonly activity: ActivityService,
    private readonly review: ReviewService,
  ) {}

  async create(trialId: number, user: AuthUser, input: CreateAnalysisDto): Promise<AnalysisSnapshot> {
    const { title, ...query } = input;
    // The answer Findings shows for these choices (the model made for the measure unless another is asked for), kept as shown.
    const result = await this.cache.answer(trialId, query, () => this.findings.findings(trialId, query));
    const choices = savedChoicesFor(query, result);
    const id = await this.sequelize.transaction(async (transaction) => {
      const row = await this.snapshots.create(
        {
          trialId,
          title: title.trim(),
          measureName: result.context.measure.name,
          roundLabel: result.context.round.label,
          scopeLabel: result.context.scope.label,
          choices: JSON.stringify(choices),
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
        summary: `Saved the analysis "${row.title}" (${row.measureName}, ${row.roundLabel}, ${row.scopeLabel}; ${analysisLabel(choices.analysis).toLowerCase()}).`,
        details: { analysisId: row.id, analysis: choices.analysis, dataHash: row.dataHash, engineVersion: row.engineVersion },
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
    const reviews = await this.reviews(trialId, rows);
    return rows.map((row) => this.summary(row, counts.get(row.id) ?? 0, reviews.get(row.id)!));
  }

  async get(trialId: number, analysisId: number): Promise<AnalysisSnapshot> {
    const row = await this.find(trialId, analysisId);
    const counts = await this.commentCounts([row.id]);
    const currentDataHash = await this.review.currentHash(trialId, row);
    const reviews = await this.review.forSnapshots(trialId, [row], new Map([[row.id, currentDataHash]]));
    return { ...this.summary(row, counts.get(row.id) ?? 0, reviews.get(row.id)!), result: JSON.parse(row.result) as FindingsAnswer, dataChanged: currentDataHash !== row.dataHash, currentDataHash };
  }

  /** Every saved analysis with its stored result (the workbook export). */
  async all(trialId: number): Promise<Array<AnalysisSnapshotSummary & { result: FindingsAnswer }>> {
    const rows = await this.snapshots.findAll({ where: { trialId }, include: people(), order: [['id', 'ASC']] });
    const counts = await this.commentCounts(rows.map((r) => r.id));
    const reviews = await this.reviews(trialId, rows);
    return rows.map((row) => ({ ...this.summary(row, counts.get(row.id) ?? 0, reviews.get(row.id)!), result: JSON.parse(row.result) as FindingsAnswer }));
  }

  private async find(trialId: number, analysisId: number): Promise<AnalysisSnapshotRow> {
    const row = await this.snapshots.findOne({
      where: { id: analysisId, trialId },
      include: people(),
    });
    if (!row) throw new NotFoundException('No such saved analysis in this trial.');
    return row;
  }

  /** Sign-offs and review status; today's data hash is computed only for analyses someone signed. */
  async reviews(trialId: number, rows: AnalysisSnapshotRow[]): Promise<Map<number, Review>> {
    const signed = new Set(
      rows.length ? (await this.signOffs.findAll({ where: { snapshotId: rows.map((r) => r.id) }, attributes: ['snapshotId'] })).map((s) => s.snapshotId) : [],
    );
    const hashes = new Map<number, string | null>();
    for (const row of rows) if (signed.has(row.id)) hashes.set(row.id, await this.review.currentHash(trialId, row));
    return this.review.forSnapshots(trialId, rows, hashes);
  }

  private async commentCounts(ids: number[]): Promise<Map<number, number>> {
    if (ids.length === 0) return new Map();
    const rows = (await this.comments.count({ where: { snapshotId: ids, deletedAt: null }, group: ['snapshot_id'] })) as unknown as Array<{ snapshot_id?: number; snapshotId?: number; count: number }>;
    return new Map(rows.map((r) => [Number(r.snapshotId ?? r.snapshot_id), Number(r.count)]));
  }

  private summary(row: AnalysisSnapshotRow, commentCount: number, review: Review): AnalysisSnapshotSummary {
    const last = review.signOffs.at(-1);
    return {
      id: row.id,
      trialId: row.trialId,
      title: row.title,
      choices: savedChoicesOf(row.choices),
      analysisLabel: analysisLabel(savedChoicesOf(row.choices).analysis),
      measureName: row.measureName,
      roundLabel: row.roundLabel,
      scopeLabel: row.scopeLabel,
      dataHash: row.dataHash,
      engineVersion: row.engineVersion,
      createdById: row.createdById,
      createdBy: row.creator?.name ?? null,
      createdAt: row.createdAt.toISOString(),
      signedOffAt: last?.signedAt ?? null,
      signedOffById: last?.userId ?? null,
      signedOffBy: last?.name ?? null,
      commentCount,
      signOffs: review.signOffs,
      review: review.review,
    };
  }
}
