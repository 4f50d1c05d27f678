import type { AssessmentRound, RemovalImpact } from '@friable/contracts';
import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { ActivityService } from '../activity/activity.service';
import { definedOnly } from '../common/defined-only';
import { changeDetails, refuseStaleEdit } from '../protocol-gate/edit-version';
import type { AuthUser } from '../common/auth-user';
import { throwIfProblems, type FieldProblem } from '../common/exceptions/field-problems.exception';
import { takenInTrial } from '../common/taken-in-trial';
import { ProtocolGateService } from '../protocol-gate/protocol-gate.service';
import { lossInWords, RemovalImpactService, whereInWords } from '../protocol-gate/removal-impact.service';
import { MeasureRow } from '../measures/models/measure.model';
import { Trial } from '../trials/models/trial.model';
import type { CreateRoundDto } from './dto/create-round.dto';
import type { UpdateRoundDto } from './dto/update-round.dto';
import { AssessmentRoundRow } from './models/assessment-round.model';
import { RoundMeasure } from './models/round-measure.model';
import { presentRound } from './round.presenter';

@Injectable()
export class RoundsService {
  constructor(
    @InjectModel(AssessmentRoundRow) private readonly rounds: typeof AssessmentRoundRow,
    @InjectModel(RoundMeasure) private readonly links: typeof RoundMeasure,
    @InjectModel(MeasureRow) private readonly measures: typeof MeasureRow,
    @InjectModel(Trial) private readonly trials: typeof Trial,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly gate: ProtocolGateService,
    private readonly removal: RemovalImpactService,
    private readonly activity: ActivityService,
  ) {}

  async list(trialId: number, transaction?: Transaction): Promise<AssessmentRound[]> {
    const trial = await this.trials.findByPk(trialId, { transaction });
    const rows = await this.rounds.findAll({
      where: { trialId },
      include: [{ model: MeasureRow, attributes: ['id'] }],
      order: [['dayOffset', 'ASC'], ['id', 'ASC']],
      transaction,
    });
    return rows.map((row) => presentRound(row, trial?.startDate ?? null));
  }

  private async one(trial: Trial, id: number, transaction: Transaction): Promise<AssessmentRound> {
    const row = await this.rounds.findOne({ where: { id, trialId: trial.id }, include: [{ model: MeasureRow, attributes: ['id'] }], transaction });
    if (!row) throw new NotFoundException('No such assessment round in this trial.');
    return presentRound(row, trial.startDate);
  }

  private async check(trialId: number, input: Partial<CreateRoundDto>, exceptId: number | null, transaction: Transaction): Promise<void> {
    const problems: FieldProblem[] = [];
    const taken = input.label === undefined ? null : await takenInTrial(this.rounds, trialId, 'label', input.label.trim(), exceptId, transaction, 'round');
    if (taken) problems.push(taken);
    if (input.measureIds !== undefined) {
      const ids = [...new Set(input.measureIds)];
      const found = await this.measures.count({ where: { trialId, id: ids }, transaction });
      if (found !== ids.length) problems.push({ field: 'measureIds', message: 'measureIds must list measures of this trial' });
    }
    throwIfProblems(problems);
  }

  private async link(roundId: number, measureIds: number[], transaction: Transaction): Promise<void> {
    await this.links.destroy({ where: { roundId }, transaction });
    await this.links.bulkCreate([...new Set(measureIds)].map((measureId) => ({ roundId, measureId })), { transaction });
  }

  async create(trialId: number, user: AuthUser, input: CreateRoundDto): Promise<AssessmentRound> {
    return this.sequelize.transaction(async (transaction) => {
      const trial = await this.gate.openForWrite(trialId, transaction);
      await this.check(trialId, input, null, transaction);
      const row = await this.rounds.create({ trialId, label: input.label.trim(), dayOffset: input.dayOffset }, { transaction });
      await this.link(row.id, input.measureIds, transaction);
      await this.activity.record(transaction, {
        trialId,
        userId: user.id,
        kind: 'round.created',
        summary: `Added assessment round ${row.label} (day ${row.dayOffset}).`,
        details: { roundId: row.id, measureIds: input.measureIds },
      });
      return this.one(trial, row.id, transaction);
    });
  }

  async update(trialId: number, id: number, user: AuthUser, sent: UpdateRoundDto): Promise<AssessmentRound> {
    const { version, ...input } = definedOnly(sent);
    return this.sequelize.transaction(async (transaction) => {
      const trial = await this.gate.openForWrite(trialId, transaction);
      const before = await this.one(trial, id, transaction);
      await refuseStaleEdit(`round ${before.label}`, before.version, sent.version, () => before);
      await this.check(trialId, input, id, transaction);
      const row = (await this.rounds.findByPk(id, { transaction })) as AssessmentRoundRow;
      row.set({ label: input.label?.trim() ?? before.label, dayOffset: input.dayOffset ?? before.dayOffset });
      if (input.measureIds !== undefined) {
        await this.link(id, input.measureIds, transaction);
        row.changed('updatedAt', true);
      }
      await row.save({ transaction });
      const after = await this.one(trial, id, transaction);
      const change = changeDetails(before, after, Object.keys(input) as Array<keyof typeof input>);
      await this.activity.record(transaction, {
        trialId,
        userId: user.id,
        kind: 'round.updated',
        summary: `Changed assessment round ${after.label}: ${change.changed.join(', ') || 'nothing'}.`,
        details: { roundId: id, version: { from: version, to: after.version }, ...change },
      });
      return after;
    });
  }

  /** What removing the round would archive (its values of every measure still shown, its photos), asked before. */
  async removalImpact(trialId: number, id: number, transaction?: Transaction): Promise<RemovalImpact> {
    const row = await this.rounds.findOne({ where: { id, trialId }, transaction });
    if (!row) throw new NotFoundException('No such assessment round in this trial.');
    return this.removal.of(trialId, { kind: 'round', id, label: row.label }, null, transaction);
  }

  /**
   * Archives the round (a paranoid model: the round and its measure list stay for the record). Its recorded values
   * and photos stay stored but leave the Ledger, Findings and exports; when there are any, the trial code must have
   * been typed (`confirm`).
   */
  async remove(trialId: number, id: number, user: AuthUser, confirm?: string): Promise<void> {
    await this.sequelize.transaction(async (transaction) => {
      const trial = await this.gate.openForWrite(trialId, transaction);
      const before = await this.one(trial, id, transaction);
      const impact = await this.removalImpact(trialId, id, transaction);
      this.removal.checkConfirmation(impact, trial.code, confirm);
      await this.rounds.destroy({ where: { id }, transaction });
      const archived = impact.confirmationNeeded ? ` with its ${lossInWords(impact)} ${whereInWords(impact.sites)}` : '';
      await this.activity.record(transaction, {
        trialId,
        userId: user.id,
        kind: 'round.archived',
        summary: `Archived assessment round ${before.label}${archived}; it leaves the protocol and stays on record.`,
        details: {
          roundId: id,
          archived: before,
          values: { recorded: impact.values, censored: impact.censored, missing: impact.missing, notes: impact.notes, photos: impact.photos, sites: impact.sites },
          confirmed: impact.confirmationNeeded,
        },
      });
    });
  }
}
