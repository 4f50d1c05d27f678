import { Injectable } from '@nestjs/common';
import { InjectConnection } from '@nestjs/sequelize';
import { QueryTypes, type Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';

/**
 * Observations guard — tells whether sites already hold observations.
 *
 * Purpose: the single place the "refuse once data exist" rules ask (re-randomizing, deleting a
 * measured treatment, changing a measure's unit, active → draft). A site holds observations when
 * any row of the observations table belongs to one of its plots (a missing value with its reason
 * counts: it was recorded).
 * Throws: nothing.
 * Example: `await guard.sitesWithObservations(1)` → [3, 4]
 */
@Injectable()
export class ObservationsGuardService {
  constructor(@InjectConnection() private readonly sequelize: Sequelize) {}

  /** Ids of the trial's sites (or of the given ones) that hold at least one observation. */
  async sitesWithObservations(trialId: number, siteIds?: number[], transaction?: Transaction): Promise<number[]> {
    if (siteIds !== undefined && siteIds.length === 0) return [];
    const rows = await this.sequelize.query<{ siteId: number }>(
      `SELECT DISTINCT p.site_id AS siteId
         FROM observations o JOIN plots p ON p.id = o.plot_id
        WHERE o.trial_id = :trialId${siteIds === undefined ? '' : ' AND p.site_id IN (:siteIds)'}
        ORDER BY p.site_id`,
      { replacements: { trialId, siteIds: siteIds ?? [] }, type: QueryTypes.SELECT, transaction },
    );
    return rows.map((row) => Number(row.siteId));
  }

  async trialHasObservations(trialId: number): Promise<boolean> {
    return (await this.sitesWithObservations(trialId)).length > 0;
  }

  async siteHasObservations(trialId: number, siteId: number): Promise<boolean> {
    return (await this.sitesWithObservations(trialId, [siteId])).length > 0;
  }
}
