import { ForbiddenException, Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { LRUCache } from 'lru-cache';
import type { AuthUser, TrialAccessContext } from '../common/auth-user';
import { DataStampsService } from '../data-stamps/data-stamps.service';
import { Trial } from './models/trial.model';
import { TrialDeparture } from './models/trial-departure.model';
import { TrialMembership } from './models/trial-membership.model';

/** How long a person's roles on a trial are kept in memory at most, even while the access stamp stays the same. */
export const KEPT_ACCESS_MS = 20_000;

interface KeptAccess {
  stamp: string;
  access: TrialAccessContext;
}

/**
 * Trial memberships as the access guard reads them. A person's roles on a trial are kept in memory (at most
 * KEPT_ACCESS_MS) with the access stamp read before them, and trusted only while the request's own read of
 * that stamp finds it unchanged: every membership change moves it (TrialMembership's model hooks), so a
 * person removed from a trial is refused on the next request, on every API instance. Refusals are not kept.
 */
@Injectable()
export class TrialMembershipsService {
  private readonly kept = new LRUCache<string, KeptAccess>({ max: 50_000, ttl: KEPT_ACCESS_MS });

  constructor(
    @InjectModel(TrialMembership) private readonly memberships: typeof TrialMembership,
    @InjectModel(Trial) private readonly trials: typeof Trial,
    @InjectModel(TrialDeparture) private readonly departures: typeof TrialDeparture,
    private readonly stamps: DataStampsService,
  ) {}

  /**
   * The caller's roles on a trial; null when the trial does not exist or the caller may not see it.
   * Throws 403 for a person removed from the trial (so a stale page says why, instead of "no such trial").
   * `request` keeps the access stamp read for the request (the session check has usually read it already).
   */
  async accessFor(user: AuthUser, trialId: number, request: { accessStamp?: Promise<string> } = {}): Promise<TrialAccessContext | null> {
    const key = `${user.id}:${user.isAdmin ? 'admin' : 'person'}:${trialId}`;
    const stamp = await this.stamps.accessStampOf(request);
    const kept = this.kept.get(key);
    if (kept?.stamp === stamp) return kept.access;
    const access = await this.read(user, trialId);
    if (access) this.kept.set(key, { stamp, access });
    return access;
  }

  private async read(user: AuthUser, trialId: number): Promise<TrialAccessContext | null> {
    const rows = await this.memberships.findAll({ where: { trialId, userId: user.id }, attributes: ['role', 'siteId'], raw: true });
    if (rows.length) {
      return Object.freeze({
        trialId,
        roles: Object.freeze([...new Set(rows.map((r) => r.role))]) as TrialAccessContext['roles'],
        siteIds: Object.freeze(rows.filter((r) => r.role === 'collaborator' && r.siteId !== null).map((r) => r.siteId as number)) as number[],
        adminReadOnly: false,
      });
    }
    if (user.isAdmin && (await this.trials.count({ where: { id: trialId } })) > 0) {
      return Object.freeze({ trialId, roles: [], siteIds: [], adminReadOnly: true });
    }
    const departure = await this.departures.findOne({ where: { trialId, userId: user.id }, order: [['id', 'DESC']] });
    if (departure) {
      throw new ForbiddenException(`You were removed from this trial on ${departure.createdAt.toISOString().slice(0, 10)}; the data you recorded stay in it under your name.`);
    }
    return null;
  }
}
