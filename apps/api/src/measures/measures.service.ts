import type { Measure, RemovalImpact } from '@friable/contracts';
import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { ActivityService } from '../activity/activity.service';
import { definedOnly } from '../common/defined-only';
import { changeDetails, refuseStaleEdit } from '../protocol-gate/edit-version';
import type { AuthUser } from '../common/auth-user';
import { takenInTrial } from '../common/taken-in-trial';
import { throwIfProblems } from '../common/exceptions/field-problems.exception';
import { ProtocolGateService } from '../protocol-gate/protocol-gate.service';
import { lossInWords, RemovalImpactService, whereInWords } from '../protocol-gate/removal-impact.service';
import { AssessmentRoundRow } from '../rounds/models/assessment-round.model';
import { RoundMeasure } from '../rounds/models/round-measure.model';
import type { CreateMeasureDto } from './dto/create-measure.dto';
import type { UpdateMeasureDto } from './dto/update-measure.dto';
import { measureProblems, presentMeasure } from './measure.presenter';
import { MeasureRow } from './models/measure.model';

/** Fields whose change would re-read every stored value of the measure. */
const MEANING_FIELDS = ['unit', 'kind', 'cutoff', 'scaleMin', 'scaleMax'] as const;

@Injectable()
export class MeasuresService {
  constructor(
    @InjectModel(MeasureRow) private readonly measures: typeof MeasureRow,
    @InjectModel(RoundMeasure) private readonly roundMeasures: typeof RoundMeasure,
    @InjectModel(AssessmentRoundRow) private readonly rounds: typeof AssessmentRoundRow,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly gate: ProtocolGateService,
    private readonly removal: RemovalImpactService,
    private readonly activity: ActivityService,
  ) {}

  async list(trialId: number, transaction?: Transaction): Promise<Measure[]> {
    const rows = await this.measures.findAll({ where: { trialId }, order: [['position', 'ASC'], ['id', 'ASC']], transaction });
    return rows.map(presentMeasure);
  }

  private async find(trialId: number, id: number, transaction: Transaction): Promise<MeasureRow> {
    const row = await this.measures.findOne({ where: { id, trialId }, transaction });
    if (!row) throw new NotFoundException('No such measure in this trial.');
    return row;
  }

  private async checkCode(trialId: number, code: string, exceptId: number | null, transaction: Transaction): Promise<void> {
    const taken = await takenInTrial(this.measures, trialId, 'code', code, exceptId, transaction, 'measure');
    throwIfProblems(taken ? [taken] : []);
  }

  /** Two measures of a trial may not share a name, whatever its case or spacing: they would head two columns alike. */
  private async checkName(trialId: number, name: string, exceptId: number | null, transaction: Transaction): Promise<void> {
    const wanted = name.trim().replace(/\s+/g, ' ').toLocaleLowerCase('en');
    const others = await this.measures.findAll({ where: { trialId }, attributes: ['id', 'code', 'name'], transaction });
    const same = others.find((m) => m.id !== exceptId && m.name.trim().replace(/\s+/g, ' ').toLocaleLowerCase('en') === wanted);
    if (same) throwIfProblems([{ field: 'name', message: `name “${name.trim()}” is already used by measure ${same.code} of this trial; give each measure its own name` }]);
  }

  async create(trialId: number, user: AuthUser, input: CreateMeasureDto): Promise<Measure> {
    return this.sequelize.transaction(async (transaction) => {
      await this.gate.openForWrite(trialId, transaction);
      await this.checkCode(trialId, input.code, null, transaction);
      await this.checkName(trialId, input.name, null, transaction);
      const values = {
        trialId,
        code: input.code,
        name: input.name.trim(),
        unit: input.unit,
        kind: input.kind,
        scaleMin: input.scaleMin ?? null,
        scaleMax: input.scaleMax ?? null,
        cutoff: input.cutoff ?? null,
        plausibleMin: input.plausibleMin ?? null,
        plausibleMax: input.plausibleMax ?? null,
        hardMin: input.hardMin ?? null,
        hardMax: input.hardMax ?? null,
        decimals: input.decimals ?? 1,
        // The API asks for it; callers inside the app (the demo) that leave it out get "lower is better" for times.
        higherIsBetter: input.higherIsBetter ?? input.kind !== 'time-with-cutoff',
        position: input.position ?? ((await this.measures.max<number, MeasureRow>('position', { where: { trialId }, transaction })) ?? 0) + 1,
      };
      throwIfProblems(measureProblems(values));
      const row = await this.measures.create(values, { transaction });
      await this.activity.record(transaction, {
        trialId,
        userId: user.id,
        kind: 'measure.created',
        summary: `Added measure ${row.code} (${row.name}, ${row.unit}).`,
        details: { measureId: row.id, code: row.code },
      });
      return presentMeasure(row);
    });
  }

  async update(trialId: number, id: number, user: AuthUser, sent: UpdateMeasureDto): Promise<Measure> {
    const { version, ...input } = definedOnly(sent);
    return this.sequelize.transaction(async (transaction) => {
      await this.gate.openForWrite(trialId, transaction);
      const row = await this.find(trialId, id, transaction);
      await refuseStaleEdit(`measure ${row.code}`, row.version, sent.version, () => presentMeasure(row));
      if (input.code !== undefined && input.code !== row.code) await this.checkCode(trialId, input.code, row.id, transaction);
      if (input.name !== undefined) await this.checkName(trialId, input.name, row.id, transaction);
      const before = presentMeasure(row);
      const merged = { ...before, ...input };
      throwIfProblems(measureProblems(merged));
      const changed = (Object.keys(input) as Array<keyof typeof input>).filter((key) => input[key] !== before[key]);
      const meaning = changed.filter((key) => (MEANING_FIELDS as readonly string[]).includes(key));
      if (meaning.length) {
        await this.gate.refuseIfObserved(trialId, 'all', `Changing the ${meaning.join(' and ')} of measure ${row.code}`, transaction);
      }
      row.set({ ...input, ...(input.name ? { name: input.name.trim() } : {}) });
      await row.save({ transaction });
      const after = presentMeasure(row);
      const change = changeDetails(before, after, Object.keys(input) as Array<keyof typeof input>);
      await this.activity.record(transaction, {
        trialId,
        userId: user.id,
        kind: 'measure.updated',
        summary: `Changed measure ${row.code}${change.changed.length ? `: ${change.changed.join(', ')}` : ''}.`,
        details: { measureId: row.id, version: { from: version, to: after.version }, ...change },
      });
      return after;
    });
  }

  /** Why the measure cannot go whatever is typed: it is the only measure of a round. Null when it can. */
  private async onlyMeasureOf(row: MeasureRow, transaction?: Transaction): Promise<string | null> {
    const links = await this.roundMeasures.findAll({ where: { measureId: row.id }, transaction });
    for (const link of links) {
      if ((await this.roundMeasures.count({ where: { roundId: link.roundId }, transaction })) === 1) {
        const round = await this.rounds.findByPk(link.roundId, { transaction });
        return `Measure ${row.code} is the only measure of round ${round?.label ?? link.roundId}; give that round another measure or delete it first.`;
      }
    }
    return null;
  }

  /** What removing the measure would archive (its values in every round still shown), asked before the removal. */
  async removalImpact(trialId: number, id: number, transaction?: Transaction): Promise<RemovalImpact> {
    const row = await this.measures.findOne({ where: { id, trialId }, transaction });
    if (!row) throw new NotFoundException('No such measure in this trial.');
    return this.removal.of(trialId, { kind: 'measure', id, code: row.code, name: row.name }, await this.onlyMeasureOf(row, transaction), transaction);
  }

  /**
   * Archives the measure (a paranoid model: the row stays for the record and the rounds no longer list it). Its
   * recorded values stay stored but leave the Ledger, Findings and exports; when there are any, the trial code
   * must have been typed (`confirm`).
   */
  async remove(trialId: number, id: number, user: AuthUser, confirm?: string): Promise<void> {
    await this.sequelize.transaction(async (transaction) => {
      const trial = await this.gate.openForWrite(trialId, transaction);
      const row = await this.find(trialId, id, transaction);
      const impact = await this.removalImpact(trialId, id, transaction);
      if (impact.refusal) throw new ConflictException(impact.refusal);
      this.removal.checkConfirmation(impact, trial.code, confirm);
      const links = await this.roundMeasures.findAll({ where: { measureId: id }, transaction });
      await this.roundMeasures.destroy({ where: { measureId: id }, transaction });
      await row.destroy({ transaction });
      const archived = impact.confirmationNeeded ? ` with its ${lossInWords(impact)} ${whereInWords(impact.sites)}` : '';
      await this.activity.record(transaction, {
        trialId,
        userId: user.id,
        kind: 'measure.archived',
        summary: `Archived measure ${row.code} (${row.name})${archived}; it leaves the protocol and stays on record.`,
        details: {
          measureId: row.id,
          code: row.code,
          archived: presentMeasure(row),
          roundIds: links.map((link) => link.roundId),
          values: { recorded: impact.values, censored: impact.censored, missing: impact.missing, notes: impact.notes, sites: impact.sites },
          confirmed: impact.confirmationNeeded,
        },
      });
    });
  }
}
