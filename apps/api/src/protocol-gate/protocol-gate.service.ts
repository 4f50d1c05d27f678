import type { LayoutImpact } from '@friable/contracts';
import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { QueryTypes, type Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { ActivityService } from '../activity/activity.service';
import { PlotRow } from '../plots/models/plot.model';
import { SiteRow } from '../sites/models/site.model';
import { Trial } from '../trials/models/trial.model';
import { ObservationsExistException } from '../common/exceptions/observations-exist.exception';
import { refuseIfClosed } from '../common/exceptions/trial-locked.exception';
import { ObservationsGuardService } from './observations-guard.service';

/**
 * Protocol gate — the checks every protocol write passes through.
 * - `openForWrite` locks the trial row for the transaction and refuses a locked or archived trial.
 * - `layoutImpact` says, before such a change, what it would clear (layouts, plots) and whether values refuse it.
 * - `clearLayouts` removes the plots of sites whose layout an edit invalidates (treatments added or
 *   removed, block count changed, factors replaced), records it, and refuses the whole edit with 409
 *   when any affected site already holds observations.
 */
@Injectable()
export class ProtocolGateService {
  constructor(
    @InjectModel(Trial) private readonly trials: typeof Trial,
    @InjectModel(SiteRow) private readonly sites: typeof SiteRow,
    @InjectModel(PlotRow) private readonly plots: typeof PlotRow,
    private readonly observations: ObservationsGuardService,
    private readonly activity: ActivityService,
    @InjectConnection() private readonly sequelize: Sequelize,
  ) {}

  /**
   * What clearing the layouts of the given sites (all of the trial's by default) would lose, in numbers and words:
   * "Clears the layouts of 3 sites, 60 plots: …". Values on the plots refuse the change (`clearLayouts` throws 409),
   * so they are named as the refusal, never as something lost. Sites without a layout are left out.
   * Throws: 404 for a site that is not the trial's.
   */
  async layoutImpact(trialId: number, siteId?: number): Promise<LayoutImpact> {
    if (siteId !== undefined && !(await this.sites.count({ where: { trialId, id: siteId } }))) throw new NotFoundException('No such site in this trial.');
    const rows = await this.sequelize.query<{ siteId: number; siteName: string; plots: number; values: number }>(
      `SELECT s.id AS siteId, s.name AS siteName,
              (SELECT COUNT(*) FROM plots p WHERE p.site_id = s.id) AS plots,
              (SELECT COUNT(*) FROM observations o JOIN plots p ON p.id = o.plot_id WHERE p.site_id = s.id) AS \`values\`
         FROM sites s
        WHERE s.trial_id = :trialId${siteId === undefined ? '' : ' AND s.id = :siteId'}
        ORDER BY s.id`,
      { replacements: { trialId, siteId: siteId ?? 0 }, type: QueryTypes.SELECT },
    );
    const sites = rows.map((r) => ({ siteId: Number(r.siteId), siteName: r.siteName, plots: Number(r.plots), values: Number(r.values) })).filter((site) => site.plots > 0);
    const plots = sites.reduce((sum, site) => sum + site.plots, 0);
    const values = sites.reduce((sum, site) => sum + site.values, 0);
    const count = (n: number, one: string, many: string) => `${n.toLocaleString('en-US')} ${n === 1 ? one : many}`;
    const summary =
      sites.length === 0
        ? 'Clears no layout: no site it touches is randomized yet.'
        : `Clears the ${sites.length === 1 ? `layout of ${sites[0]!.siteName}` : `layouts of ${count(sites.length, 'site', 'sites')}`}, ${count(plots, 'plot', 'plots')}: ` +
          `${sites.length === 1 ? 'the site' : 'each site'} must be randomized again, and printed sheets and plot labels made anew.`;
    const holding = sites.filter((site) => site.values > 0);
    const refusal = holding.length
      ? `Refused while values are recorded: ${holding.map((site) => `${site.siteName} holds ${count(site.values, 'value', 'values')}`).join(', ')}; their meaning would change.`
      : null;
    return { sites, layouts: sites.length, plots, values, summary, refusal };
  }

  async openForWrite(trialId: number, transaction: Transaction): Promise<Trial> {
    const trial = await this.trials.findByPk(trialId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!trial) throw new NotFoundException('No such trial.');
    refuseIfClosed(trial);
    return trial;
  }

  /** Refuses with 409 when any of the sites holds observations; `what` names the edit ("Deleting treatment G40"). */
  async refuseIfObserved(trialId: number, siteIds: number[] | 'all', what: string, transaction: Transaction): Promise<void> {
    const sites = await this.sites.findAll({ where: siteIds === 'all' ? { trialId } : { trialId, id: siteIds }, transaction });
    const observed = new Set(await this.observations.sitesWithObservations(trialId, sites.map((s) => s.id)));
    const names = sites.filter((s) => observed.has(s.id)).map((s) => s.name);
    if (names.length) throw new ObservationsExistException(what, names);
  }

  /** Clears the layout of the given sites (all of the trial's by default); returns the names cleared. */
  async clearLayouts(
    trialId: number,
    siteIds: number[] | 'all',
    change: { userId: number | null; what: string },
    transaction: Transaction,
  ): Promise<string[]> {
    await this.refuseIfObserved(trialId, siteIds, change.what, transaction);
    const sites = await this.sites.findAll({ where: siteIds === 'all' ? { trialId } : { trialId, id: siteIds }, transaction });
    const cleared: string[] = [];
    for (const site of sites) {
      const removed = await this.plots.destroy({ where: { siteId: site.id }, transaction });
      if (!removed && !site.randomizedAt) continue;
      site.randomizedAt = null;
      site.randomizationSeed = null;
      await site.save({ transaction });
      cleared.push(site.name);
      await this.activity.record(transaction, {
        trialId,
        userId: change.userId,
        kind: 'site.layout-cleared',
        siteId: site.id,
        summary: `${change.what} cleared the plot layout of ${site.name}; randomize the site again.`,
        details: { plotsRemoved: removed, reason: change.what },
      });
    }
    return cleared;
  }
}
