import { ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { Transaction } from 'sequelize';
import type { TrialRole } from '@friable/contracts';
import type { TrialAccessContext } from '../common/auth-user';
import { TrialMembership } from '../trials/models/trial-membership.model';
import { User } from '../users/models/user.model';

/** A person holding a role on a trial, as the team and review features name them. */
export interface TrialMemberPerson {
  id: number;
  name: string;
  email: string;
}

/**
 * Trial member guard — the one place that answers who holds which role on a trial, for the features that
 * decide on it beyond the route's own access rule (comments, review and sign-off, the team, invitations).
 * The caller's roles come from the access guard (TrialAccessContext); other people's from trial_memberships.
 * Throws: 403 with the caller's refusal from requireRole, 404 "not on this trial's team" from requireMember.
 * Example: `guard.requireRole(access, ['investigator', 'reviewer'], 'Only … can resolve a thread.')`.
 */
@Injectable()
export class TrialMemberGuard {
  constructor(@InjectModel(TrialMembership) private readonly memberships: typeof TrialMembership) {}

  /** Whether the caller holds any of the roles on the route's trial. */
  holds(access: TrialAccessContext, roles: readonly TrialRole[]): boolean {
    return access.roles.some((role) => roles.includes(role));
  }

  /** Refuses (403, in the given words) a caller holding none of the roles. */
  requireRole(access: TrialAccessContext, roles: readonly TrialRole[], refusal: string): void {
    if (!this.holds(access, roles)) throw new ForbiddenException(refusal);
  }

  /** The person's membership rows on the trial (one per role and site); 404 when they hold none. */
  async requireMember(trialId: number, userId: number, transaction?: Transaction): Promise<TrialMembership[]> {
    const rows = await this.memberships.findAll({ where: { trialId, userId }, transaction });
    if (!rows.length) throw new NotFoundException(`Person ${userId} is not on this trial's team.`);
    return rows;
  }

  /** Whether the person already holds exactly this role (at this site, for a collaborator) on the trial. */
  async holdsPlace(trialId: number, userId: number, role: TrialRole, siteId: number | null, transaction?: Transaction): Promise<boolean> {
    return (await this.memberships.count({ where: { trialId, userId, role, siteId }, transaction })) > 0;
  }

  /** How many people (not rows) hold the role on the trial. */
  countPeople(trialId: number, role: TrialRole, transaction?: Transaction): Promise<number> {
    return this.memberships.count({ where: { trialId, role }, distinct: true, col: 'user_id', transaction });
  }

  /** The people holding a role on the trial, one entry each, by name. */
  async people(trialId: number, role: TrialRole, transaction?: Transaction): Promise<TrialMemberPerson[]> {
    const rows = await this.memberships.findAll({ where: { trialId, role }, include: [{ model: User, attributes: ['id', 'name', 'email'] }], transaction });
    const byId = new Map(rows.filter((r) => r.user).map((r) => [r.userId, { id: r.userId, name: r.user!.name, email: r.user!.email }]));
    return [...byId.values()].sort((a, b) => a.name.localeCompare(b.name));
  }
}
