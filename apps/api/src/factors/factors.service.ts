import type { Factor, Treatment } from '@friable/contracts';
import { factorCombinations, isFactorDesign } from '@friable/field';
import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { ActivityService } from '../activity/activity.service';
import type { AuthUser } from '../common/auth-user';
import { refuseStaleEdit } from '../protocol-gate/edit-version';
import { throwIfProblems, type FieldProblem } from '../common/exceptions/field-problems.exception';
import { ProtocolGateService } from '../protocol-gate/protocol-gate.service';
import { levelIdColumns } from '../treatments/factor-level-columns';
import { TreatmentRow } from '../treatments/models/treatment.model';
import { treatmentRateProblems } from '../treatments/treatment.presenter';
import { TreatmentsService } from '../treatments/treatments.service';
import { Trial, type TrialDesign } from '../trials/models/trial.model';
import type { FactorLevelDto, FactorsDto } from './dto/factors.dto';
import { factorCountProblem } from './factor-count';
import { presentFactor } from './factor.presenter';
import { FactorLevel } from './models/factor-level.model';
import { TrialFactor } from './models/trial-factor.model';

/** A combination's treatment name: the level names joined, cut to the 120 characters a treatment name holds. */
function combinationName(names: readonly string[]): string {
  const joined = names.join(' × ');
  return joined.length <= 120 ? joined : `${joined.slice(0, 119)}…`;
}

/** A level's rate fields, defaults filled in, as stored. */
function levelValues(level: FactorLevelDto) {
  return {
    code: level.code,
    name: level.name.trim(),
    description: level.description?.trim() || null,
    rateValue: level.rateValue ?? null,
    rateUnit: level.rateUnit ?? null,
    rateBasis: level.rateBasis ?? 'area',
    incorporationDepthCm: level.incorporationDepthCm ?? null,
    product: level.product?.trim() || null,
    purity: level.purity ?? null,
    moistureBasis: level.moistureBasis ?? 'as-is',
    moistureFraction: level.moistureFraction ?? null,
    materialKind: level.materialKind ?? 'other',
  };
}

/** Problems of the factors that need no stored rows: repeated level codes, clashing combination codes, a rate without its unit. */
function inputProblems(input: FactorsDto): FieldProblem[] {
  const problems: FieldProblem[] = [];
  input.factors.forEach((factor, index) => {
    const codes = factor.levels.map((l) => l.code.toUpperCase());
    const repeated = codes.find((code, i) => codes.indexOf(code) !== i);
    if (repeated) problems.push({ field: `factors.${index}.levels`, message: `levels of ${factor.name} use the code ${repeated} twice` });
    factor.levels.forEach((level, levelIndex) => {
      for (const problem of treatmentRateProblems(levelValues(level))) {
        problems.push({ field: `factors.${index}.levels.${levelIndex}.${problem.field}`, message: `${factor.name}, level ${level.code}: ${problem.message}` });
      }
    });
  });
  const codes = factorCombinations(input.factors.map((f) => f.levels)).map((c) => c.code.toUpperCase());
  const clash = codes.find((code, i) => codes.indexOf(code) !== i);
  if (clash) problems.push({ field: 'factors', message: `factors give the combination code ${clash} twice; choose level codes that join uniquely` });
  return problems;
}

@Injectable()
export class FactorsService {
  constructor(
    @InjectModel(TrialFactor) private readonly factors: typeof TrialFactor,
    @InjectModel(FactorLevel) private readonly levels: typeof FactorLevel,
    @InjectModel(TreatmentRow) private readonly treatments: typeof TreatmentRow,
    @InjectModel(Trial) private readonly trials: typeof Trial,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly gate: ProtocolGateService,
    private readonly treatmentService: TreatmentsService,
    private readonly activity: ActivityService,
  ) {}

  /** GET …/factors: the trial's factors, each with where its levels go on for the trial's design. */
  async listForTrial(trialId: number): Promise<Factor[]> {
    const trial = await this.trials.findByPk(trialId);
    if (!trial) throw new NotFoundException('No such trial.');
    return this.list(trialId, trial.design);
  }

  async list(trialId: number, design: TrialDesign, transaction?: Transaction): Promise<Factor[]> {
    const rows = await this.factors.findAll({ where: { trialId }, include: [FactorLevel], order: [['position', 'ASC']], transaction });
    return rows.map((row, index) => presentFactor(row, design, index));
  }

  /**
   * Replaces the factors; the treatments become every combination (kept when their code stays). When the factors
   * and their level codes are the same as before, only names, descriptions and rates change, in place: the plot
   * layouts, level ids and treatments stay.
   */
  async replace(trialId: number, user: AuthUser, input: FactorsDto): Promise<{ factors: Factor[]; treatments: Treatment[] }> {
    throwIfProblems(inputProblems(input));
    return this.sequelize.transaction(async (transaction) => {
      const trial = await this.gate.openForWrite(trialId, transaction);
      if (!isFactorDesign(trial.design)) throw new ConflictException('Factors apply only to factorial and split-plot designs; change the design first.');
      const countProblem = factorCountProblem(trial.design, input.factors.length);
      if (countProblem) throwIfProblems([{ field: 'factors', message: countProblem }]);
      const existing = await this.factors.findAll({ where: { trialId }, include: [FactorLevel], order: [['position', 'ASC']], transaction });
      await this.refuseStale(trial, existing, input);
      const sameCodes =
        existing.length === input.factors.length &&
        existing.every((factor, index) => {
          const stored = [...(factor.levels ?? [])].sort((x, y) => x.position - y.position).map((l) => l.code);
          return stored.join('\u0000') === input.factors[index]!.levels.map((l) => l.code).join('\u0000');
        });
      if (sameCodes) await this.updateInPlace(trial, user, existing, input, transaction);
      else await this.rebuild(trial, user, input, transaction);
      return { factors: await this.list(trialId, trial.design, transaction), treatments: await this.treatmentService.list(trialId, transaction) };
    });
  }

  /** Each factor stored must be sent with the version it was read at (a factor added at the end has none). */
  private async refuseStale(trial: Trial, existing: TrialFactor[], input: FactorsDto): Promise<void> {
    throwIfProblems(
      existing.flatMap((factor, index) => {
        const sent = input.factors[index];
        return sent && sent.version === undefined ? [{ field: `factors[${index}].version`, message: `factors[${index}].version is needed: factor ${factor.name} exists (version ${factor.version})` }] : [];
      }),
    );
    const stale = existing.find((factor, index) => input.factors[index] !== undefined && input.factors[index]!.version !== factor.version);
    if (!stale) return;
    const sent = input.factors[existing.indexOf(stale)]!.version as number;
    await refuseStaleEdit(`factor ${stale.name}`, stale.version, sent, () => this.list(trial.id, trial.design));
  }

  private async updateInPlace(trial: Trial, user: AuthUser, existing: TrialFactor[], input: FactorsDto, transaction: Transaction): Promise<void> {
    const levelsById = new Map<number, FactorLevel>();
    for (const [index, factor] of existing.entries()) {
      factor.name = input.factors[index]!.name.trim();
      // A change of its levels is a change of the factor: its version moves on.
      factor.changed('updatedAt', true);
      await factor.save({ transaction });
      const stored = [...(factor.levels ?? [])].sort((x, y) => x.position - y.position);
      for (const [levelIndex, level] of stored.entries()) {
        level.set(levelValues(input.factors[index]!.levels[levelIndex]!));
        await level.save({ transaction });
        levelsById.set(level.id, level);
      }
    }
    // A combination's name follows its levels' names.
    for (const row of await this.treatments.findAll({ where: { trialId: trial.id }, transaction })) {
      const levels = [row.factorLevelAId, row.factorLevelBId, row.factorLevelCId, row.factorLevelDId].map((id) => (id === null ? undefined : levelsById.get(id)));
      const named = levels.filter((level): level is FactorLevel => level !== undefined);
      if (named.length !== existing.length) continue;
      row.name = combinationName(named.map((level) => level.name));
      await row.save({ transaction });
    }
    await this.activity.record(transaction, {
      trialId: trial.id,
      userId: user.id,
      kind: 'factors.updated',
      summary: `Changed the names or rates of the levels of ${input.factors.map((f) => f.name.trim()).join(' × ')}; the plot layouts stay.`,
      details: { factors: input.factors },
    });
  }

  private async rebuild(trial: Trial, user: AuthUser, input: FactorsDto, transaction: Transaction): Promise<void> {
    const trialId = trial.id;
    const combinations = factorCombinations(input.factors.map((f) => f.levels));
    await this.gate.clearLayouts(trialId, 'all', { userId: user.id, what: 'Changing the factors' }, transaction);
    const existing = await this.treatments.findAll({ where: { trialId }, transaction });
    const wanted = new Set(combinations.map((c) => c.code.toUpperCase()));
    for (const row of existing) if (!wanted.has(row.code.toUpperCase())) await row.destroy({ transaction });
    // The new factors count on from the old ones' versions, so an edit read before the change stays stale.
    const version = Math.max(0, ...(await this.factors.findAll({ where: { trialId }, transaction })).map((row) => row.version)) + 1;
    await this.factors.destroy({ where: { trialId }, transaction });
    const created: FactorLevel[][] = [];
    for (const [index, factor] of input.factors.entries()) {
      const row = await this.factors.create({ trialId, position: index + 1, name: factor.name.trim(), version }, { transaction });
      created.push(await this.levels.bulkCreate(factor.levels.map((level, position) => ({ factorId: row.id, ...levelValues(level), position: position + 1 })), { transaction }));
    }
    const kept = new Map(existing.filter((row) => wanted.has(row.code.toUpperCase())).map((row) => [row.code.toUpperCase(), row]));
    for (const [position, combination] of factorCombinations(created).entries()) {
      const levelIds = combination.levels.map((level) => level.id);
      const row = kept.get(combination.code.toUpperCase());
      if (row) {
        row.set({ ...levelIdColumns(levelIds), name: combinationName(combination.levels.map((level) => level.name)), position: position + 1 });
        await row.save({ transaction });
      } else {
        await this.treatmentService.insert(
          trial,
          user,
          { code: combination.code, name: combinationName(combination.levels.map((level) => level.name)), isControl: position === 0, factorLevelIds: levelIds, position: position + 1 },
          transaction,
        );
      }
    }
    await this.activity.record(transaction, {
      trialId,
      userId: user.id,
      kind: 'factors.replaced',
      summary: `Set the factors ${input.factors.map((f) => `${f.name.trim()} (${f.levels.length} levels)`).join(' × ')}: ${combinations.length} treatments.`,
      details: { factors: input.factors },
    });
  }
}
