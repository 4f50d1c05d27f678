import type { Member, TrialRole } from '@friable/contracts';
import { ConflictException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { ActivityService } from '../activity/activity.service';
import type { AuthUser } from '../common/auth-user';
import { FieldProblemsException } from '../common/exceptions/field-problems.exception';
import { mailConfig } from '../config/mail.config';
import { MailService } from '../mail/mail.service';
import { noticeEmail } from '../mail/notice-email';
import { Trial } from '../trials/models/trial.model';
import { TrialDeparture } from '../trials/models/trial-departure.model';
import { TrialMembership } from '../trials/models/trial-membership.model';
import { TrialMemberGuard } from '../protocol-gate/trial-member-guard.service';
import { User } from '../users/models/user.model';
import type { UpdateMemberDto } from './dto/update-member.dto';
import { SiteNamesService } from './site-names.service';

const roleOrder = { investigator: 0, collaborator: 1, reviewer: 2 } as const;
const article = (role: TrialRole) => (role === 'investigator' ? 'an' : 'a');

/** How a person's place on a trial reads in a sentence: "a collaborator at Millbrook and Quarry Hill". */
function placeWords(role: TrialRole, siteNames: string[]): string {
  return `${article(role)} ${role}${siteNames.length ? ` at ${siteNames.join(' and ')}` : ''}`;
}

/**
 * The Team — who holds which role on a trial, and the investigator's changes to it: a member's role and
 * sites, and removing a member (who loses access on their next request; what they recorded stays theirs).
 * A trial always keeps an investigator. Each change goes to the activity trail in its transaction and is
 * e-mailed to the person afterwards (a mail failure is logged, the change stands).
 * Throws: 404 for a person not on the trial, 409 for the last investigator, 422 for sites.
 */
@Injectable()
export class MembersService {
  constructor(
    @InjectModel(TrialMembership) private readonly memberships: typeof TrialMembership,
    @InjectModel(TrialDeparture) private readonly departures: typeof TrialDeparture,
    @InjectModel(Trial) private readonly trials: typeof Trial,
    @InjectModel(User) private readonly users: typeof User,
    @InjectConnection() private readonly sequelize: Sequelize,
    @Inject(mailConfig.KEY) private readonly mailSettings: ConfigType<typeof mailConfig>,
    private readonly siteNames: SiteNamesService,
    private readonly activity: ActivityService,
    private readonly mail: MailService,
    private readonly guard: TrialMemberGuard,
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

  /** Gives the person one role on the trial (a collaborator: one or more sites), replacing what they held. */
  async update(trialId: number, userId: number, input: UpdateMemberDto, actor: AuthUser): Promise<Member[]> {
    const siteIds = [...new Set(input.siteIds ?? [])];
    const notice = await this.sequelize.transaction(async (transaction) => {
      const { trial, rows, person } = await this.lockMember(trialId, userId, transaction);
      const sites = await this.siteNames.forTrial(trialId, transaction);
      if (input.role === 'collaborator' && siteIds.length === 0) {
        throw new FieldProblemsException([{ field: 'siteIds', message: 'siteIds must name at least one site for a collaborator' }]);
      }
      if (input.role !== 'collaborator' && siteIds.length > 0) {
        throw new FieldProblemsException([{ field: 'siteIds', message: 'siteIds apply only to collaborators; leave them out for this role' }]);
      }
      const unknown = siteIds.filter((id) => !sites.has(id));
      if (unknown.length) throw new FieldProblemsException([{ field: 'siteIds', message: `siteIds must be sites of this trial; ${unknown.join(', ')} is not` }]);
      if (input.role !== 'investigator') await this.keepAnInvestigator(trialId, rows, transaction);
      const before = this.describe(rows, sites);
      await this.memberships.destroy({ where: { trialId, userId }, transaction });
      const targets = input.role === 'collaborator' ? siteIds : [null];
      await this.memberships.bulkCreate(
        targets.map((siteId) => ({ trialId, userId, role: input.role, siteId })),
        { transaction },
      );
      const after = placeWords(input.role, siteIds.map((id) => sites.get(id) as string));
      await this.activity.record(transaction, {
        trialId,
        userId: actor.id,
        kind: 'member.changed',
        summary: `Changed ${person.name} from ${before} to ${after}.`,
        details: { memberId: userId, before: rows.map((r) => ({ role: r.role, siteId: r.siteId })), role: input.role, siteIds },
      });
      return noticeEmail({
        to: person.email,
        subject: `Your role on the trial ${trial.code} changed`,
        paragraphs: [
          `Hello ${person.name},`,
          `${actor.name} changed your place on the trial "${trial.title}" (${trial.code}): you were ${before} and are now ${after}.`,
          'The change took effect at once. Anything you recorded before stays in the trial under your name.',
        ],
        link: { href: `${this.mailSettings.appUrl}/trials/${trialId}`, label: 'Open the trial' },
      });
    });
    await this.mail.sendOrLog(notice);
    return this.list(trialId);
  }

  /** Removes the person from the trial: every role goes, a departure is kept, their recorded data stay attributed to them. */
  async remove(trialId: number, userId: number, actor: AuthUser): Promise<void> {
    const notice = await this.sequelize.transaction(async (transaction) => {
      const { trial, rows, person } = await this.lockMember(trialId, userId, transaction);
      await this.keepAnInvestigator(trialId, rows, transaction);
      const sites = await this.siteNames.forTrial(trialId, transaction);
      const before = this.describe(rows, sites);
      await this.memberships.destroy({ where: { trialId, userId }, transaction });
      await this.departures.create({ trialId, userId, roles: [...new Set(rows.map((r) => r.role))].join(','), removedById: actor.id }, { transaction });
      await this.activity.record(transaction, {
        trialId,
        userId: actor.id,
        kind: 'member.removed',
        summary: `Removed ${person.name} (${before}) from the trial; what they recorded stays under their name.`,
        details: { memberId: userId, roles: rows.map((r) => ({ role: r.role, siteId: r.siteId })) },
      });
      return noticeEmail({
        to: person.email,
        subject: `You were removed from the trial ${trial.code}`,
        paragraphs: [
          `Hello ${person.name},`,
          `${actor.name} removed you from the trial "${trial.title}" (${trial.code}), where you were ${before}. You can no longer open it.`,
          'Anything you recorded stays in the trial under your name. If this is a mistake, ask the investigator to invite you again.',
        ],
      });
    });
    await this.mail.sendOrLog(notice);
  }

  private async lockMember(trialId: number, userId: number, transaction: Transaction) {
    // The trial row is locked so two changes to the team cannot both remove "the other" investigator.
    const trial = await this.trials.findByPk(trialId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!trial) throw new NotFoundException('No such trial.');
    const rows = await this.guard.requireMember(trialId, userId, transaction);
    const person = await this.users.findByPk(userId, { transaction });
    if (!person) throw new NotFoundException(`Person ${userId} is not on this trial's team.`);
    return { trial, rows, person };
  }

  private async keepAnInvestigator(trialId: number, rows: TrialMembership[], transaction: Transaction): Promise<void> {
    if (!rows.some((r) => r.role === 'investigator')) return;
    const others = await this.guard.countPeople(trialId, 'investigator', transaction);
    if (others <= 1) {
      throw new ConflictException('A trial always keeps at least one investigator: invite or name another investigator first.');
    }
  }

  private describe(rows: TrialMembership[], sites: Map<number, string>): string {
    const roles = [...new Set(rows.map((r) => r.role))].sort((a, b) => roleOrder[a] - roleOrder[b]);
    return roles
      .map((role) => placeWords(role, rows.filter((r) => r.role === role && r.siteId !== null).map((r) => sites.get(r.siteId as number) ?? `site ${r.siteId}`)))
      .join(' and ');
  }

}
