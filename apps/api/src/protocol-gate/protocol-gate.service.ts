import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { Transaction } from 'sequelize';
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
  ) {}

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
