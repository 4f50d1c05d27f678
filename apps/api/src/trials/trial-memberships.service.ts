import { ForbiddenException, Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { AuthUser, TrialAccessContext } from '../common/auth-user';
import { Trial } from './models/trial.model';
import { TrialDeparture } from './models/trial-departure.model';
import { TrialMembership } from './models/trial-membership.model';

@Injectable()
export class TrialMembershipsService {
  constructor(
    @InjectModel(TrialMembership) private readonly memberships: typeof TrialMembership,
    @InjectModel(Trial) private readonly trials: typeof Trial,
    @InjectModel(TrialDeparture) private readonly departures: typeof TrialDeparture,
  ) {}

  /**
   * The caller's roles on a trial; null when the trial does not exist or the caller may not see it.
   * Throws 403 for a person removed from the trial (so a stale page says why, instead of "no such trial").
   */
  async accessFor(user: AuthUser, trialId: number): Promise<TrialAccessContext | null> {
    const rows = await this.memberships.findAll({ where: { trialId, userId: user.id } });
    if (rows.length) {
      return {
        trialId,
        roles: [...new Set(rows.map((r) => r.role))],
        siteIds: rows.filter((r) => r.role === 'collaborator' && r.siteId !== null).map((r) => r.siteId as number),
        adminReadOnly: false,
      };
    }
    if (user.isAdmin && (await this.trials.count({ where: { id: trialId } })) > 0) {
      return { trialId, roles: [], siteIds: [], adminReadOnly: true };
    }
    const departure = await this.departures.findOne({ where: { trialId, userId: user.id }, order: [['id', 'DESC']] });
    if (departure) {
      throw new ForbiddenException(`You were removed from this trial on ${departure.createdAt.toISOString().slice(0, 10)}; the data you recorded stay in it under your name.`);
    }
    return null;
  }
}
