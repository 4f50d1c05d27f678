import type { Member } from '@friable/contracts';
import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { TrialMembership } from '../trials/models/trial-membership.model';
import { User } from '../users/models/user.model';
import { SiteNamesService } from './site-names.service';

const roleOrder = { investigator: 0, collaborator: 1, reviewer: 2 } as const;

@Injectable()
export class MembersService {
  constructor(
    @InjectModel(TrialMembership) private readonly memberships: typeof TrialMembership,
    private readonly siteNames: SiteNamesService,
  ) {}

  /** Everyone holding a role on the trial: investigators first, then collaborators, then reviewers, by name. */
  async list(trialId: number): Promise<Member[]> {
    const [rows, sites] = await Promise.all([
      this.memberships.findAll({ where: { trialId }, include: [{ model: User, attributes: ['id', 'name', 'email'] }] }),
      this.siteNames.forTrial(trialId),
    ]);
    const members = rows.map(
      (row): Member => ({
        membershipId: row.id,
        userId: row.userId,
        name: row.user?.name ?? '',
        email: row.user?.email ?? '',
        role: row.role,
        siteId: row.siteId,
        siteName: row.siteId === null ? null : (sites.get(row.siteId) ?? null),
        since: (row.get('createdAt') as Date).toISOString(),
      }),
    );
    return members.sort((a, b) => roleOrder[a.role] - roleOrder[b.role] || a.name.localeCompare(b.name) || (a.siteName ?? '').localeCompare(b.siteName ?? ''));
  }
}
