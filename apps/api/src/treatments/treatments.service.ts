import type { Treatment } from '@friable/contracts';
import { isFactorDesign } from '@friable/field';
import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { Sequelize } from 'sequelize-typescript';
import type { Transaction } from 'sequelize';
import { ActivityService } from '../activity/activity.service';
import { definedOnly } from '../common/defined-only';
import { changeDetails, refuseStaleEdit } from '../protocol-gate/edit-version';
import type { AuthUser } from '../common/auth-user';
import { takenInTrial } from '../common/taken-in-trial';
import { throwIfProblems } from '../common/exceptions/field-problems.exception';
import { ProtocolGateService } from '../protocol-gate/protocol-gate.service';
import type { Trial } from '../trials/models/trial.model';
import type { CreateTreatmentDto } from './dto/create-treatment.dto';
import type { UpdateTreatmentDto } from './dto/update-treatment.dto';
import { levelIdColumns } from './factor-level-columns';
import { TreatmentRow } from './models/treatment.model';
import { presentTreatment, treatmentRateProblems } from './treatment.presenter';

const factorialRefusal = "The treatments of a factorial or split-plot trial are every combination of its factor levels; change the factors instead.";

@Injectable()
export class TreatmentsService {
  constructor(
    @InjectModel(TreatmentRow) private readonly treatments: typeof TreatmentRow,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly gate: ProtocolGateService,
    private readonly activity: ActivityService,
  ) {}

  async list(trialId: number, transaction?: Transaction): Promise<Treatment[]> {
    const rows = await this.treatments.findAll({ where: { trialId }, order: [['position', 'ASC'], ['id', 'ASC']], transaction });
    return rows.map(presentTreatment);
  }

  private async find(trialId: number, id: number, transaction: Transaction): Promise<TreatmentRow> {
    const row = await this.treatments.findOne({ where: { id, trialId }, transaction });
    if (!row) throw new NotFoundException('No such treatment in this trial.');
    return row;
  }

  private async checkCode(trialId: number, code: string, exceptId: number | null, transaction: Transaction): Promise<void> {
    const taken = await takenInTrial(this.treatments, trialId, 'code', code, exceptId, transaction, 'treatment');
    throwIfProblems(taken ? [taken] : []);
  }

  async create(trialId: number, user: AuthUser, input: CreateTreatmentDto): Promise<Treatment> {
    return this.sequelize.transaction(async (transaction) => {
      const trial = await this.gate.openForWrite(trialId, transaction);
      if (isFactorDesign(trial.design)) throw new ConflictException(factorialRefusal);
      const row = await this.insert(trial, user, input, transaction);
      await this.gate.clearLayouts(trialId, 'all', { userId: user.id, what: `Adding treatment ${row.code}` }, transaction);
      return presentTreatment(row);
    });
  }

  /** Writes one treatment after its checks; shared with factor-generated combinations. */
  async insert(trial: Trial, user: AuthUser, input: CreateTreatmentDto & { factorLevelIds?: readonly number[] }, transaction: Transaction): Promise<TreatmentRow> {
    await this.checkCode(trial.id, input.code, null, transaction);
    const values = {
      trialId: trial.id,
      code: input.code,
      name: input.name.trim(),
      description: input.description ?? null,
      isControl: input.isControl ?? false,
      rateValue: input.rateValue ?? null,
      rateUnit: input.rateUnit ?? null,
      rateBasis: input.rateBasis ?? 'area',
      incorporationDepthCm: input.incorporationDepthCm ?? null,
      product: input.product ?? null,
      purity: input.purity ?? null,
      moistureBasis: input.moistureBasis ?? 'as-is',
      moistureFraction: input.moistureFraction ?? null,
      materialKind: input.materialKind ?? 'other',
      ...levelIdColumns(input.factorLevelIds ?? []),
      position: input.position ?? ((await this.treatments.max<number, TreatmentRow>('position', { where: { trialId: trial.id }, transaction })) ?? 0) + 1,
    };
    throwIfProblems(treatmentRateProblems(values));
    const row = await this.treatments.create(values, { transaction });
    await this.activity.record(transaction, {
      trialId: trial.id,
      userId: user.id,
      kind: 'treatment.created',
      summary: `Added treatment ${row.code} (${row.name}).`,
      details: { treatmentId: row.id, code: row.code },
    });
    return row;
  }

  async update(trialId: number, id: number, user: AuthUser, sent: UpdateTreatmentDto): Promise<Treatment> {
    const { version, ...input } = definedOnly(sent);
    return this.sequelize.transaction(async (transaction) => {
      await this.gate.openForWrite(trialId, transaction);
      const row = await this.find(trialId, id, transaction);
      await refuseStaleEdit(`treatment ${row.code}`, row.version, sent.version, () => presentTreatment(row));
      if (input.code !== undefined && input.code !== row.code) await this.checkCode(trialId, input.code, row.id, transaction);
      const before = presentTreatment(row);
      const merged = { ...before, ...input, name: input.name?.trim() ?? before.name };
      throwIfProblems(treatmentRateProblems(merged));
      row.set({ ...input, name: merged.name });
      await row.save({ transaction });
      const after = presentTreatment(row);
      const change = changeDetails(before, after, Object.keys(input) as Array<keyof typeof input>);
      await this.activity.record(transaction, {
        trialId,
        userId: user.id,
        kind: 'treatment.updated',
        summary: `Changed treatment ${row.code}${change.changed.length ? `: ${change.changed.join(', ')}` : ''}.`,
        details: { treatmentId: row.id, version: { from: version, to: after.version }, ...change },
      });
      return after;
    });
  }

  async remove(trialId: number, id: number, user: AuthUser): Promise<void> {
    await this.sequelize.transaction(async (transaction) => {
      const trial = await this.gate.openForWrite(trialId, transaction);
      if (isFactorDesign(trial.design)) throw new ConflictException(factorialRefusal);
      const row = await this.find(trialId, id, transaction);
      await this.gate.clearLayouts(trialId, 'all', { userId: user.id, what: `Deleting treatment ${row.code}` }, transaction);
      // Archived, not deleted (a paranoid model): the row stays for the record.
      await row.destroy({ transaction });
      await this.activity.record(transaction, {
        trialId,
        userId: user.id,
        kind: 'treatment.archived',
        summary: `Archived treatment ${row.code} (${row.name}); it leaves the protocol and stays on record.`,
        details: { treatmentId: row.id, code: row.code, archived: presentTreatment(row) },
      });
    });
  }
}
