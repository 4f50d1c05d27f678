import { Injectable } from '@nestjs/common';

/**
 * Observations guard — tells whether sites already hold observations.
 *
 * Purpose: the single place the "refuse once data exist" rules ask (re-randomizing, deleting a
 * measured treatment, changing a measure's unit, active → draft). The observations table arrives
 * with data intake; until then no site can hold observations, so every answer is "none".
 * Throws: nothing.
 * Example: `await guard.sitesWithObservations(1)` → [] (until observations exist)
 */
@Injectable()
export class ObservationsGuardService {
  /** Ids of the trial's sites (or of the given ones) that hold at least one observation. */
  async sitesWithObservations(_trialId: number, _siteIds?: number[]): Promise<number[]> {
    return [];
  }

  async trialHasObservations(trialId: number): Promise<boolean> {
    return (await this.sitesWithObservations(trialId)).length > 0;
  }

  async siteHasObservations(trialId: number, siteId: number): Promise<boolean> {
    return (await this.sitesWithObservations(trialId, [siteId])).length > 0;
  }
}
