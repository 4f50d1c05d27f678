import type { Factor, Treatment } from '@friable/contracts';
import { ConflictException, Injectable } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { ActivityService } from '../activity/activity.service';
import type { AuthUser } from '../auth/auth-user';
import { throwIfProblems, type FieldProblem } from '../common/exceptions/field-problems.exception';
import { ProtocolGateService } from '../common/protocol/protocol-gate.service';
import { TreatmentRow } from '../treatments/models/treatment.model';
import { TreatmentsService } from '../treatments/treatments.service';
import type { FactorsDto } from './dto/factors.dto';
import { FactorLevel } from './models/factor-level.model';
import { TrialFactor } from './models/trial-factor.model';

/** Every combination of two factors' levels, A's levels outermost: code `A.code + B.code`. */
export function factorCombinations<L extends { code: string; name: string }>(a: L[], b: L[]): Array<{ code: string; name: string; a: L; b: L }> {
  return a.flatMap((levelA) => b.map((levelB) => ({ code: `${levelA.code}${levelB.code}`, name: `${levelA.name} × ${levelB.name}`, a: levelA, b: levelB })));
}

@Injectable()
export class FactorsService {
  constructor(
    @InjectModel(TrialFactor) private readonly factors: typeof TrialFactor,
    @InjectModel(FactorLevel) private readonly levels: typeof FactorLevel,
    @InjectModel(TreatmentRow) private readonly treatments: typeof TreatmentRow,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly gate: ProtocolGateService,
    private readonly treatmentService: TreatmentsService,
    private readonly activity: ActivityService,
  ) {}

  async list(trialId: number, transaction?: Transaction): Promise<Factor[]> {
    const rows = await this.factors.findAll({ where: { trialId }, include: [FactorLevel], order: [['position', 'ASC']], transaction });
    return rows.map((f) => ({
      id: f.id,
      position: f.position,
      name: f.name,
      levels: [...(f.levels ?? [])].sort((x, y) => x.position - y.position).map((l) => ({ id: l.id, code: l.code, name: l.name })),
    }));
  }

  /** Replaces the factors; treatments become every combination (kept when their code stays, so their rates stay). */
  async replace(trialId: number, user: AuthUser, input: FactorsDto): Promise<{ factors: Factor[]; treatments: Treatment[] }> {
    const problems: FieldProblem[] = [];
    input.factors.forEach((factor, index) => {
      const codes = factor.levels.map((l) => l.code.toUpperCase());
      const repeated = codes.find((code, i) => codes.indexOf(code) !== i);
      if (repeated) problems.push({ field: `factors.${index}.levels`, message: `levels of ${factor.name} use the code ${repeated} twice` });
    });
    const combinations = factorCombinations(input.factors[0].levels, input.factors[1].levels);
    const combinationCodes = combinations.map((c) => c.code.toUpperCase());
    const clash = combinationCodes.find((code, i) => combinationCodes.indexOf(code) !== i);
    if (clash) problems.push({ field: 'factors', message: `factors give the combination code ${clash} twice; choose level codes that join uniquely` });
    throwIfProblems(problems);

    return this.sequelize.transaction(async (transaction) => {
      const trial = await this.gate.openForWrite(trialId, transaction);
      if (trial.design !== 'factorial-rcbd') throw new ConflictException('Factors apply only to a factorial-rcbd trial; change the design first.');
      await this.gate.clearLayouts(trialId, 'all', { userId: user.id, what: 'Changing the factors' }, transaction);
      const existing = await this.treatments.findAll({ where: { trialId }, transaction });
      const wanted = new Set(combinationCodes);
      for (const row of existing) if (!wanted.has(row.code.toUpperCase())) await row.destroy({ transaction });
      await this.factors.destroy({ where: { trialId }, transaction });
      const created: FactorLevel[][] = [];
      for (const [index, factor] of input.factors.entries()) {
        const row = await this.factors.create({ trialId, position: index + 1, name: factor.name.trim() }, { transaction });
        created.push(
          await this.levels.bulkCreate(
            factor.levels.map((level, position) => ({ factorId: row.id, code: level.code, name: level.name.trim(), position: position + 1 })),
            { transaction },
          ),
        );
      }
      const kept = new Map(existing.filter((row) => wanted.has(row.code.toUpperCase())).map((row) => [row.code.toUpperCase(), row]));
      for (const [position, combination] of factorCombinations(created[0], created[1]).entries()) {
        const row = kept.get(combination.code.toUpperCase());
        if (row) {
          row.set({ factorLevelAId: combination.a.id, factorLevelBId: combination.b.id, position: position + 1 });
          await row.save({ transaction });
        } else {
          await this.treatmentService.insert(
            trial,
            user,
            { code: combination.code, name: combination.name, isControl: position === 0, factorLevelAId: combination.a.id, factorLevelBId: combination.b.id, position: position + 1 },
            transaction,
          );
        }
      }
      await this.activity.record(transaction, {
        trialId,
        userId: user.id,
        kind: 'factors.replaced',
        summary: `Set the factors ${input.factors.map((f) => `${f.name} (${f.levels.length} levels)`).join(' × ')}: ${combinations.length} treatments.`,
        details: { factors: input.factors },
      });
      return { factors: await this.list(trialId, transaction), treatments: await this.treatmentService.list(trialId, transaction) };
    });
  }
}
