import type { TrialDetail, TrialSummary } from '@friable/contracts';
import { isFactorDesign } from '@friable/field';
import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { randomBytes } from 'node:crypto';
import { QueryTypes, type Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { ActivityService } from '../activity/activity.service';
import { definedOnly } from '../common/defined-only';
import { changeDetails, refuseStaleEdit } from '../protocol-gate/edit-version';
import type { AuthUser, TrialAccessContext } from '../common/auth-user';
import { FieldProblemsException } from '../common/exceptions/field-problems.exception';
import { refuseIfClosed, TrialLockedException } from '../common/exceptions/trial-locked.exception';
import { ObservationsGuardService } from '../protocol-gate/observations-guard.service';
import { ProtocolGateService } from '../protocol-gate/protocol-gate.service';
import { FactorsService } from '../factors/factors.service';
import { TrialFactor } from '../factors/models/trial-factor.model';
import { MeasuresService } from '../measures/measures.service';
import { RoundsService } from '../rounds/rounds.service';
import { SitesService } from '../sites/sites.service';
import { TreatmentsService } from '../treatments/treatments.service';
import { activationCheck } from './activation-check';
import type { CreateTrialDto } from './dto/create-trial.dto';
import type { UpdateTrialDto } from './dto/update-trial.dto';
import { Trial } from './models/trial.model';
import { TrialMembership, type TrialRole } from './models/trial-membership.model';
import { statusTransitionRefusal } from './status-transition';

function summarise(trial: Trial, roles: TrialRole[]): TrialSummary {
  return {
    id: trial.id,
    code: trial.code,
    title: trial.title,
    design: trial.design,
    status: trial.status,
    myRoles: roles,
    updatedAt: trial.updatedAt.toISOString(),
  };
}

const trimmed = (text: string | null | undefined) => (text === undefined ? undefined : text === null ? null : text.trim() || null);

@Injectable()
export class TrialsService {
  constructor(
    @InjectModel(Trial) private readonly trials: typeof Trial,
    @InjectModel(TrialMembership) private readonly memberships: typeof TrialMembership,
    @InjectModel(TrialFactor) private readonly factors: typeof TrialFactor,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly treatments: TreatmentsService,
    private readonly measures: MeasuresService,
    private readonly rounds: RoundsService,
    private readonly sites: SitesService,
    private readonly factorService: FactorsService,
    private readonly gate: ProtocolGateService,
    private readonly observations: ObservationsGuardService,
    private readonly activity: ActivityService,
  ) {}

  /** The trials the person holds a role on; an instance administrator sees every trial. */
  async listFor(user: AuthUser): Promise<TrialSummary[]> {
    const mine = await this.memberships.findAll({ where: { userId: user.id } });
    const rolesByTrial = new Map<number, TrialRole[]>();
    for (const m of mine) rolesByTrial.set(m.trialId, [...new Set([...(rolesByTrial.get(m.trialId) ?? []), m.role])]);
    const trials = await this.trials.findAll({
      where: user.isAdmin ? {} : { id: [...rolesByTrial.keys()] },
      order: [['updatedAt', 'DESC'], ['id', 'DESC']],
    });
    return trials.map((t) => summarise(t, rolesByTrial.get(t.id) ?? []));
  }

  async create(input: CreateTrialDto, user: AuthUser): Promise<TrialSummary> {
    return this.sequelize.transaction(async (transaction) => {
      const trial = await this.trials.create(
        {
          code: input.code.toUpperCase(),
          title: input.title.trim(),
          design: input.design ?? 'rcbd',
          status: 'draft',
          question: trimmed(input.question) ?? null,
          startDate: input.startDate ?? null,
          seed: input.seed ?? randomBytes(6).toString('hex'),
          safetyNotes: trimmed(input.safetyNotes) ?? null,
          createdBy: user.id,
        },
        { transaction },
      );
      await this.memberships.create({ trialId: trial.id, userId: user.id, role: 'investigator', siteId: null }, { transaction });
      await this.activity.record(transaction, {
        trialId: trial.id,
        userId: user.id,
        kind: 'trial.created',
        summary: `Created trial ${trial.code} (${trial.design}) with seed ${trial.seed}.`,
        details: { code: trial.code, design: trial.design, seed: trial.seed },
      });
      return summarise(trial, ['investigator']);
    });
  }

  /** The whole protocol of a trial, with the activation checks. */
  async get(access: TrialAccessContext, transaction?: Transaction): Promise<TrialDetail> {
    const trial = await this.trials.findByPk(access.trialId, { transaction });
    if (!trial) throw new NotFoundException('No such trial.');
    const [factors, treatments, measures, rounds, sites] = [
      await this.factorService.list(trial.id, trial.design, transaction),
      await this.treatments.list(trial.id, transaction),
      await this.measures.list(trial.id, transaction),
      await this.rounds.list(trial.id, transaction),
      await this.sites.list(trial.id, transaction),
    ];
    return {
      id: trial.id,
      version: trial.version,
      code: trial.code,
      title: trial.title,
      question: trial.question,
      design: trial.design,
      status: trial.status,
      startDate: trial.startDate,
      seed: trial.seed,
      safetyNotes: trial.safetyNotes,
      noControlReason: trial.noControlReason,
      ownerId: trial.createdBy,
      myRoles: access.roles,
      mySiteIds: access.siteIds,
      updatedAt: trial.updatedAt.toISOString(),
      factors,
      treatments,
      measures,
      rounds,
      sites,
      activation: activationCheck({ design: trial.design, factorCount: factors.length, noControlReason: trial.noControlReason, treatments, measures, rounds, sites }),
    };
  }

  /** Changes the protocol's own fields and, last, the status (draft → active needs every activation check). */
  async update(access: TrialAccessContext, sent: UpdateTrialDto, user: AuthUser): Promise<TrialDetail> {
    const { version, ...input } = definedOnly(sent);
    return this.sequelize.transaction(async (transaction) => {
      const trial = await this.trials.findByPk(access.trialId, { transaction, lock: transaction.LOCK.UPDATE });
      if (!trial) throw new NotFoundException('No such trial.');
      const { status, reason, ...fields } = input;
      const fieldNames = (Object.keys(fields) as Array<keyof typeof fields>).filter((key) => fields[key] !== undefined);
      // A locked trial takes no edit whatever copy it was made from: say so before any talk of versions.
      if (fieldNames.length) refuseIfClosed(trial);
      await refuseStaleEdit(`trial ${trial.code}`, trial.version, sent.version, () => this.get(access, transaction));
      if (fieldNames.length) {
        await this.gate.openForWrite(trial.id, transaction);
        if (fields.design !== undefined && fields.design !== trial.design) {
          await this.gate.clearLayouts(trial.id, 'all', { userId: user.id, what: `Changing the design from ${trial.design} to ${fields.design}` }, transaction);
          // Between factorial and split designs the factors stay (the activation check says when their number no longer fits);
          // a one-factor design has none.
          if (isFactorDesign(trial.design) && !isFactorDesign(fields.design)) await this.factors.destroy({ where: { trialId: trial.id }, transaction });
        }
        const before = { ...(trial.get({ plain: true }) as Record<string, unknown>) };
        trial.set({
          ...fields,
          ...(fields.title !== undefined ? { title: fields.title.trim() } : {}),
          ...(fields.question !== undefined ? { question: trimmed(fields.question) } : {}),
          ...(fields.safetyNotes !== undefined ? { safetyNotes: trimmed(fields.safetyNotes) } : {}),
          ...(fields.noControlReason !== undefined ? { noControlReason: trimmed(fields.noControlReason) } : {}),
        });
        trial.changed('updatedAt', true);
        await trial.save({ transaction });
        await this.activity.record(transaction, {
          trialId: trial.id,
          userId: user.id,
          kind: 'trial.updated',
          summary: `Changed the trial's ${fieldNames.join(', ')}.`,
          details: { version: { from: version, to: trial.version }, ...changeDetails(before, trial.get({ plain: true }) as Record<string, unknown>, fieldNames) },
        });
      }
      if (status !== undefined && status !== trial.status) await this.changeStatus(trial, status, access, user, transaction, reason?.trim() || null);
      return this.get(access, transaction);
    });
  }

  private async changeStatus(trial: Trial, status: Trial['status'], access: TrialAccessContext, user: AuthUser, transaction: Transaction, reason: string | null): Promise<void> {
    const refusal = statusTransitionRefusal(trial.status, status, await this.observations.trialHasObservations(trial.id));
    if (refusal) throw trial.status === 'locked' ? new TrialLockedException('locked') : new ConflictException(refusal);
    const signOffs = trial.status === 'locked' ? await this.signOffCount(trial.id, transaction) : 0;
    if (signOffs > 0 && !reason) {
      throw new FieldProblemsException([
        { field: 'reason', message: `reason is required to unlock this trial: its analyses carry ${signOffs} sign-off${signOffs === 1 ? '' : 's'}, which will show "data changed after sign-off" if the data change` },
      ]);
    }
    if (status === 'active' && trial.status === 'draft') {
      const { activation } = await this.get(access, transaction);
      if (!activation.ready) {
        throw new FieldProblemsException(
          activation.problems.map((message) => ({ field: 'status', message })),
          `The trial cannot become active yet: ${activation.problems.join(' ')}`,
        );
      }
    }
    const from = trial.status;
    trial.status = status;
    await trial.save({ transaction });
    await this.activity.record(transaction, {
      trialId: trial.id,
      userId: user.id,
      kind: 'trial.status-changed',
      summary: `Changed the trial from ${from} to ${status}${reason ? `: ${reason}` : '.'}`,
      details: { from, to: status, ...(reason ? { reason } : {}), ...(signOffs ? { signOffs } : {}) },
    });
  }

  /** Sign-offs of the trial's saved analyses (the review feature owns the table). */
  private async signOffCount(trialId: number, transaction: Transaction): Promise<number> {
    const [row] = await this.sequelize.query<{ n: number | string }>('SELECT COUNT(*) AS n FROM analysis_sign_offs WHERE trial_id = ? AND withdrawn_at IS NULL', {
      replacements: [trialId],
      type: QueryTypes.SELECT,
      transaction,
    });
    return Number(row?.n ?? 0);
  }
}
