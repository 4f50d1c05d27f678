import type { Site } from '@friable/contracts';
import { DESIGN_RULES, isFactorDesign, plotLabelPrefix, randomizeSite, type PlotAssignment } from '@friable/field';
import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { fn, col, type Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { ActivityService } from '../activity/activity.service';
import { definedOnly } from '../common/defined-only';
import { changeDetails, refuseStaleEdit } from '../protocol-gate/edit-version';
import type { AuthUser } from '../common/auth-user';
import { throwIfProblems, type FieldProblem } from '../common/exceptions/field-problems.exception';
import { takenInTrial } from '../common/taken-in-trial';
import { ObservationsGuardService } from '../protocol-gate/observations-guard.service';
import { ProtocolGateService } from '../protocol-gate/protocol-gate.service';
import { factorCountProblem } from '../factors/factor-count';
import { FactorLevel } from '../factors/models/factor-level.model';
import { TrialFactor } from '../factors/models/trial-factor.model';
import { PlotRow } from '../plots/models/plot.model';
import { levelIdsOf } from '../treatments/factor-level-columns';
import { TreatmentRow } from '../treatments/models/treatment.model';
import { Trial } from '../trials/models/trial.model';
import { TrialMembership } from '../trials/models/trial-membership.model';
import { User } from '../users/models/user.model';
import type { CreateSiteDto } from './dto/create-site.dto';
import type { UpdateSiteDto } from './dto/update-site.dto';
import { SiteRow } from './models/site.model';
import { geometryProblems, presentSite, siteGeometry } from './site.presenter';

/** The layout key of a site: its id, which never changes (its name may). */
export const siteKey = (siteId: number) => `site-${siteId}`;

@Injectable()
export class SitesService {
  constructor(
    @InjectModel(SiteRow) private readonly sites: typeof SiteRow,
    @InjectModel(PlotRow) private readonly plots: typeof PlotRow,
    @InjectModel(TreatmentRow) private readonly treatments: typeof TreatmentRow,
    @InjectModel(TrialMembership) private readonly memberships: typeof TrialMembership,
    @InjectModel(Trial) private readonly trials: typeof Trial,
    @InjectModel(TrialFactor) private readonly factors: typeof TrialFactor,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly gate: ProtocolGateService,
    private readonly observations: ObservationsGuardService,
    private readonly activity: ActivityService,
  ) {}

  async list(trialId: number, transaction?: Transaction): Promise<Site[]> {
    const trial = await this.trials.findByPk(trialId, { transaction });
    if (!trial) throw new NotFoundException('No such trial.');
    const rows = await this.sites.findAll({ where: { trialId }, include: [{ model: User, attributes: ['id', 'name'] }], order: [['id', 'ASC']], transaction });
    const counts = (await this.plots.findAll({
      attributes: ['siteId', [fn('COUNT', col('id')), 'plots']],
      where: { trialId },
      group: ['siteId'],
      raw: true,
      transaction,
    })) as unknown as Array<{ siteId: number; plots: number | string }>;
    const plotCount = new Map(counts.map((c) => [Number(c.siteId), Number(c.plots)]));
    const observed = new Set(await this.observations.sitesWithObservations(trialId));
    const treatmentCount = await this.treatments.count({ where: { trialId }, transaction });
    const factors = (await this.factorsOf(trialId, transaction)).map((factor) => ({ name: factor.name, levels: factor.levels!.length }));
    return rows.map((row) =>
      presentSite(row, { design: trial.design, treatmentCount, factors, plotCount: plotCount.get(row.id) ?? 0, hasObservations: observed.has(row.id) }),
    );
  }

  /** The trial's factors in order, each with its levels in order. */
  private async factorsOf(trialId: number, transaction?: Transaction): Promise<TrialFactor[]> {
    const factors = await this.factors.findAll({ where: { trialId }, include: [FactorLevel], order: [['position', 'ASC']], transaction });
    for (const factor of factors) factor.levels = [...(factor.levels ?? [])].sort((a, b) => a.position - b.position);
    return factors;
  }

  async one(trialId: number, id: number, transaction?: Transaction): Promise<Site> {
    const site = (await this.list(trialId, transaction)).find((s) => s.id === id);
    if (!site) throw new NotFoundException('No such site in this trial.');
    return site;
  }

  private async find(trialId: number, id: number, transaction: Transaction): Promise<SiteRow> {
    const row = await this.sites.findOne({ where: { id, trialId }, transaction });
    if (!row) throw new NotFoundException('No such site in this trial.');
    return row;
  }

  private async defaultPrefix(trialId: number, name: string, transaction: Transaction): Promise<string> {
    let base: string;
    try {
      base = plotLabelPrefix(name);
    } catch {
      throwIfProblems([{ field: 'labelPrefix', message: 'labelPrefix is needed: the name has fewer than two Latin letters to make one from' }]);
      throw new Error('unreachable');
    }
    const taken = new Set((await this.sites.findAll({ where: { trialId }, attributes: ['labelPrefix'], transaction })).map((s) => s.labelPrefix));
    const candidates = [base, ...'ABCDEFGHIJKLMNOPQRSTUVWXYZ'.split('').map((letter) => `${base.slice(0, 2)}${letter}`)];
    const free = candidates.find((c) => !taken.has(c));
    if (!free) throwIfProblems([{ field: 'labelPrefix', message: 'labelPrefix is needed: every prefix made from the name is taken' }]);
    return free as string;
  }

  private async check(trialId: number, input: Partial<CreateSiteDto>, exceptId: number | null, transaction: Transaction): Promise<void> {
    const problems: FieldProblem[] = [];
    for (const field of ['name', 'labelPrefix'] as const) {
      const value = input[field]?.trim();
      const taken = value === undefined ? null : await takenInTrial(this.sites, trialId, field, value, exceptId, transaction, 'site');
      if (taken) problems.push(taken);
    }
    if (input.leadUserId !== undefined && input.leadUserId !== null) {
      const member = await this.memberships.count({ where: { trialId, userId: input.leadUserId, role: ['collaborator', 'investigator'] }, transaction });
      if (!member) problems.push({ field: 'leadUserId', message: 'leadUserId must be a collaborator or investigator of this trial' });
    }
    throwIfProblems(problems);
  }

  async create(trialId: number, user: AuthUser, input: CreateSiteDto): Promise<Site> {
    return this.sequelize.transaction(async (transaction) => {
      await this.gate.openForWrite(trialId, transaction);
      await this.check(trialId, input, null, transaction);
      const geometry = {
        shape: input.shape,
        lengthM: input.lengthM ?? null,
        widthM: input.widthM ?? null,
        diameterCm: input.diameterCm ?? null,
        containerDepthCm: input.containerDepthCm ?? null,
        soilVolumeL: input.soilVolumeL ?? null,
      };
      throwIfProblems(geometryProblems(geometry));
      const row = await this.sites.create(
        {
          trialId,
          name: input.name.trim(),
          location: input.location ?? null,
          soilDescription: input.soilDescription ?? null,
          ...geometry,
          blocks: input.blocks,
          labelPrefix: input.labelPrefix ?? (await this.defaultPrefix(trialId, input.name, transaction)),
          leadUserId: input.leadUserId ?? null,
        },
        { transaction },
      );
      await this.activity.record(transaction, {
        trialId,
        userId: user.id,
        kind: 'site.created',
        siteId: row.id,
        summary: `Added site ${row.name} with ${row.blocks} blocks.`,
        details: { labelPrefix: row.labelPrefix },
      });
      return this.one(trialId, row.id, transaction);
    });
  }

  async update(trialId: number, id: number, user: AuthUser, sent: UpdateSiteDto): Promise<Site> {
    const { version, ...input } = definedOnly(sent);
    return this.sequelize.transaction(async (transaction) => {
      await this.gate.openForWrite(trialId, transaction);
      const row = await this.find(trialId, id, transaction);
      await refuseStaleEdit(`site ${row.name}`, row.version, sent.version, () => this.one(trialId, id, transaction));
      const before = await this.one(trialId, id, transaction);
      await this.check(trialId, input, id, transaction);
      throwIfProblems(geometryProblems({ ...siteGeometry(row), ...input }));
      if (input.blocks !== undefined && input.blocks !== row.blocks) {
        await this.gate.clearLayouts(trialId, [id], { userId: user.id, what: `Changing the blocks of ${row.name} from ${row.blocks} to ${input.blocks}` }, transaction);
        await row.reload({ transaction });
      }
      if (input.labelPrefix !== undefined && input.labelPrefix !== row.labelPrefix && (await this.plots.count({ where: { siteId: id }, transaction }))) {
        throw new ConflictException('The label prefix of a randomized site is printed on its plot labels; it cannot change now.');
      }
      row.set({ ...input, ...(input.name ? { name: input.name.trim() } : {}) });
      await row.save({ transaction });
      const after = await this.one(trialId, id, transaction);
      const change = changeDetails(before, after, Object.keys(input) as Array<keyof typeof input>);
      await this.activity.record(transaction, {
        trialId,
        userId: user.id,
        kind: 'site.updated',
        siteId: id,
        summary: `Changed site ${row.name}: ${change.changed.join(', ') || 'nothing'}.`,
        details: { version: { from: version, to: after.version }, ...change },
      });
      return after;
    });
  }

  async remove(trialId: number, id: number, user: AuthUser): Promise<void> {
    await this.sequelize.transaction(async (transaction) => {
      await this.gate.openForWrite(trialId, transaction);
      const row = await this.find(trialId, id, transaction);
      const archived = await this.one(trialId, id, transaction);
      // An archived site keeps no layout (refused when it holds observations), and stays on record.
      await this.gate.clearLayouts(trialId, [id], { userId: user.id, what: `Deleting site ${row.name}` }, transaction);
      await row.reload({ transaction });
      await row.destroy({ transaction });
      await this.activity.record(transaction, {
        trialId,
        userId: user.id,
        kind: 'site.archived',
        siteId: id,
        summary: `Archived site ${row.name}; it leaves the protocol and stays on record.`,
        details: { name: row.name, archived },
      });
    });
  }

  /**
   * The site's layout from the seed, each plot with its treatment's id. Factorial and split designs lay out their
   * factors' levels (a split plot restricted to whole plots within blocks, sub plots within whole plots) and find
   * each plot's treatment by its level ids; a one-factor design lays out the treatment codes.
   */
  private async layout(trial: Trial, site: SiteRow, treatments: TreatmentRow[], seed: string, transaction: Transaction): Promise<Array<{ plot: PlotAssignment; treatmentId: number }>> {
    const base = { seed, siteKey: siteKey(site.id), design: trial.design, blocks: site.blocks, labelPrefix: site.labelPrefix };
    if (!isFactorDesign(trial.design)) {
      const idByCode = new Map(treatments.map((t) => [t.code, t.id]));
      return randomizeSite({ ...base, treatments: treatments.map((t) => t.code) }).map((plot) => ({ plot, treatmentId: idByCode.get(plot.treatmentCode)! }));
    }
    const factors = await this.factorsOf(trial.id, transaction);
    const countProblem = factors.length === 0 ? `The ${DESIGN_RULES[trial.design].name} design needs its factors before a site can be randomized.` : factorCountProblem(trial.design, factors.length);
    if (countProblem) throw new ConflictException(countProblem);
    const levelIds = factors.map((factor) => new Map(factor.levels!.map((level) => [level.code, level.id])));
    const treatmentByLevels = new Map(treatments.map((t) => [levelIdsOf(t).join(','), t.id]));
    const layout = randomizeSite({ ...base, factors: factors.map((factor) => ({ name: factor.name, levels: factor.levels!.map((level) => level.code) })) });
    return layout.map((plot) => {
      const treatmentId = treatmentByLevels.get(plot.levels.map((code, index) => levelIds[index]!.get(code)).join(','));
      if (treatmentId === undefined) throw new ConflictException(`No treatment is the combination ${plot.treatmentCode}; save the factors again to rebuild the treatments.`);
      return { plot, treatmentId };
    });
  }

  /** Lays out the site's plots from the seed (the trial's unless given); refused once the site has observations. */
  async randomize(trialId: number, id: number, user: AuthUser, seedText?: string): Promise<Site> {
    return this.sequelize.transaction(async (transaction) => {
      const trial = await this.gate.openForWrite(trialId, transaction);
      const row = await this.find(trialId, id, transaction);
      await this.gate.refuseIfObserved(trialId, [id], `Re-randomizing ${row.name}`, transaction);
      const treatments = await this.treatments.findAll({ where: { trialId }, order: [['position', 'ASC'], ['id', 'ASC']], transaction });
      if (treatments.length < 2) throw new ConflictException('A site can be randomized once the trial has at least two treatments.');
      const seed = seedText ?? trial.seed;
      const placed = await this.layout(trial, row, treatments, seed, transaction);
      const previous = await this.plots.destroy({ where: { siteId: id }, transaction });
      await this.plots.bulkCreate(
        placed.map(({ plot, treatmentId }) => ({
          trialId,
          siteId: id,
          block: plot.block,
          position: plot.position,
          wholePlot: plot.wholePlot,
          subPlot: plot.subPlot,
          subSubPlot: plot.subSubPlot,
          treatmentId,
          label: plot.label,
        })),
        { transaction },
      );
      const layout = placed.map(({ plot }) => plot);
      row.randomizedAt = new Date();
      row.randomizationSeed = seed;
      await row.save({ transaction });
      await this.activity.record(transaction, {
        trialId,
        userId: user.id,
        kind: 'site.randomized',
        siteId: id,
        summary: `${previous ? 'Re-randomized' : 'Randomized'} ${row.name} with seed ${seed}: ${layout.length} plots.`,
        details: { seed, siteKey: siteKey(id), design: trial.design, plots: layout.length, replacedPlots: previous },
      });
      return this.one(trialId, id, transaction);
    });
  }
}
