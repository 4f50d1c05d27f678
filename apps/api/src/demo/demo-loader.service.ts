import type { FactorsInput, MeasureKind, RateBasis, RateUnitId, TrialStatus } from '@friable/contracts';
import { Injectable, Logger } from '@nestjs/common';
import { InjectConnection } from '@nestjs/sequelize';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import type { Sequelize } from 'sequelize-typescript';
import type { AuthUser, TrialAccessContext } from '../common/auth-user';
import { FactorsService } from '../factors/factors.service';
import type { CreateMeasureDto } from '../measures/dto/create-measure.dto';
import { MeasuresService } from '../measures/measures.service';
import { RoundsService } from '../rounds/rounds.service';
import { SitesService } from '../sites/sites.service';
import { TreatmentsService } from '../treatments/treatments.service';
import { Trial } from '../trials/models/trial.model';
import { TrialMembership } from '../trials/models/trial-membership.model';
import { TrialsService } from '../trials/trials.service';
import { User } from '../users/models/user.model';
import { DemoObservationsService } from './demo-observations';
import { loadDemoScenario } from './demo-scenario';

interface DemoProtocol {
  code: string;
  status: TrialStatus;
  question: string | null;
  startDate: string | null;
  seed: string;
  safetyNotes: string | null;
  /** Factorial and split-plot trials: the factors from the whole plot down, levels with their rates. */
  factors?: FactorsInput['factors'];
  treatments?: Array<{ code: string; name: string; isControl?: boolean; description?: string; rateValue?: number; rateUnit?: RateUnitId; rateBasis?: RateBasis; product?: string; materialKind?: 'gypsum' | 'other' }>;
  measures: Array<{ code: string; name: string; unit: string; kind: MeasureKind } & Record<string, number | string | boolean>>;
  rounds: Array<{ label: string; dayOffset: number; measures: string[] }>;
  sites: Array<{ name: string; labelPrefix: string; shape: 'rectangle' | 'round'; blocks: number; lead: string } & Record<string, number | string>>;
}

export const demoProtocolFile = resolve(__dirname, '../../../../datasets/demo/protocol.json');

/**
 * Demo loader — the invented Fernwick scenario: people and trials, then each trial's protocol built
 * through the same services the API uses (so every check and activity entry applies), sites
 * randomized with the trial's fixed seed, and activation through the status checks.
 * Idempotent: a trial that already has treatments, measures or sites is left as it is.
 */
@Injectable()
export class DemoLoaderService {
  private readonly logger = new Logger('Demo');

  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly trials: TrialsService,
    private readonly treatments: TreatmentsService,
    private readonly factors: FactorsService,
    private readonly measures: MeasuresService,
    private readonly rounds: RoundsService,
    private readonly sites: SitesService,
    private readonly observations: DemoObservationsService,
  ) {}

  async load(password: string): Promise<{ created: number; protocols: string[] }> {
    const { created } = await loadDemoScenario(this.sequelize, password);
    const plans = (JSON.parse(readFileSync(demoProtocolFile, 'utf8')) as { trials: DemoProtocol[] }).trials;
    const protocols: string[] = [];
    for (const plan of plans) if (await this.loadProtocol(plan)) protocols.push(plan.code);
    await this.observations.fill('FW-CLAY-26');
    return { created, protocols };
  }

  private async loadProtocol(plan: DemoProtocol): Promise<boolean> {
    const trial = await Trial.findOne({ where: { code: plan.code } });
    if (!trial) throw new Error(`demo protocol ${plan.code} has no trial in people.json`);
    const access: TrialAccessContext = { trialId: trial.id, roles: ['investigator'], siteIds: [], adminReadOnly: false };
    const detail = await this.trials.get(access);
    if (detail.treatments.length || detail.measures.length || detail.sites.length) return false;
    const owner = await User.findByPk(trial.createdBy ?? 0);
    if (!owner) throw new Error(`demo trial ${plan.code} has no owner`);
    const user: AuthUser = { id: owner.id, email: owner.email, name: owner.name, isAdmin: owner.isAdmin };

    await this.trials.update(access, { version: detail.version, question: plan.question, startDate: plan.startDate, seed: plan.seed, safetyNotes: plan.safetyNotes }, user);
    if (plan.factors) await this.factors.replace(trial.id, user, { factors: plan.factors });
    for (const treatment of plan.treatments ?? []) await this.treatments.create(trial.id, user, treatment);
    const measureIds = new Map<string, number>();
    // A demo measure that does not say which way is better gets the usual answer: shorter times are better.
    for (const measure of plan.measures) {
      const body = { higherIsBetter: measure.kind !== 'time-with-cutoff', ...measure } as CreateMeasureDto;
      measureIds.set(measure.code, (await this.measures.create(trial.id, user, body)).id);
    }
    for (const round of plan.rounds) {
      await this.rounds.create(trial.id, user, { label: round.label, dayOffset: round.dayOffset, measureIds: round.measures.map((code) => measureIds.get(code) as number) });
    }
    for (const { lead, ...site } of plan.sites) {
      const leadUser = await User.findOne({ where: { email: lead } });
      const created = await this.sites.create(trial.id, user, { ...site, leadUserId: leadUser?.id ?? null });
      if (leadUser) await TrialMembership.update({ siteId: created.id }, { where: { trialId: trial.id, userId: leadUser.id, role: 'collaborator' } });
      await this.sites.randomize(trial.id, created.id, user);
    }
    const current = await this.trials.get(access);
    if (plan.status === 'active' && current.status !== 'active') await this.trials.update(access, { version: current.version, status: 'active' }, user);
    if (plan.status === 'active' && !current.activation.ready) throw new Error(`demo trial ${plan.code} does not pass its activation checks: ${current.activation.problems.join(' ')}`);
    this.logger.log(`protocol of ${plan.code} loaded`);
    return true;
  }
}
