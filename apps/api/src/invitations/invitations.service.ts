import type { Invitation, InvitationAcceptResponse, InvitationPreview } from '@friable/contracts';
import {
  ConflictException,
  ForbiddenException,
  Inject,
  Injectable,
  NotFoundException,
  UnprocessableEntityException,
} from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { Op, type Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { ActivityService } from '../activity/activity.service';
import type { AuthUser } from '../common/auth-user';
import { PasswordHasher } from '../auth/password-hasher.service';
import { passwordProblem } from '../auth/password-policy';
import { SessionsService, type StartedSession } from '../auth/sessions.service';
import { SignInLockoutService } from '../auth/sign-in-lockout.service';
import { mailConfig } from '../config/mail.config';
import { MailService } from '../mail/mail.service';
import { SiteNamesService } from '../team/site-names.service';
import { Trial } from '../trials/models/trial.model';
import { TrialMembership } from '../trials/models/trial-membership.model';
import { TrialMemberGuard } from '../protocol-gate/trial-member-guard.service';
import { User } from '../users/models/user.model';
import { toPublicUser } from '../users/public-user';
import type { AcceptInvitationDto } from './dto/accept-invitation.dto';
import type { CreateInvitationDto } from './dto/create-invitation.dto';
import { invitationEmail } from './invitation-email';
import { InvitationGoneException } from './invitation-gone.exception';
import { InvitationNotFoundException } from './invitation-not-found.exception';
import { hashInvitationToken, newInvitationToken } from './invitation-token';
import { TrialInvitation } from './models/trial-invitation.model';

type InvitationStatus = Invitation['status'];

export function invitationStatus(row: TrialInvitation, now: Date): InvitationStatus {
  if (row.acceptedAt) return 'accepted';
  if (row.revokedAt) return 'revoked';
  return row.expiresAt.getTime() <= now.getTime() ? 'expired' : 'pending';
}

const fieldError = (field: string, message: string) => new UnprocessableEntityException({ message: `Please correct: ${message}.`, errors: [{ field, message }] });

/** Invitations to a trial: sending, resending and withdrawing them, and accepting one from its e-mailed link. */
@Injectable()
export class InvitationsService {
  constructor(
    @InjectModel(TrialInvitation) private readonly invitations: typeof TrialInvitation,
    @InjectModel(TrialMembership) private readonly memberships: typeof TrialMembership,
    @InjectModel(Trial) private readonly trials: typeof Trial,
    @InjectModel(User) private readonly users: typeof User,
    @InjectConnection() private readonly sequelize: Sequelize,
    @Inject(mailConfig.KEY) private readonly mailSettings: ConfigType<typeof mailConfig>,
    private readonly mail: MailService,
    private readonly activity: ActivityService,
    private readonly siteNames: SiteNamesService,
    private readonly sessions: SessionsService,
    private readonly hasher: PasswordHasher,
    private readonly lockout: SignInLockoutService,
    private readonly members: TrialMemberGuard,
  ) {}

  /** Every invitation of the trial, newest first, with its status now. */
  async list(trialId: number): Promise<Invitation[]> {
    const [rows, sites] = await Promise.all([
      this.invitations.findAll({ where: { trialId }, include: [{ model: User, attributes: ['id', 'name'] }], order: [['id', 'DESC']] }),
      this.siteNames.forTrial(trialId),
    ]);
    const now = new Date();
    return rows.map((row) => this.toInvitation(row, sites, now));
  }

  async create(trialId: number, inviter: AuthUser, input: CreateInvitationDto): Promise<Invitation> {
    const email = input.email.trim().toLowerCase();
    const role = input.role;
    const siteId = input.siteId ?? null;
    const sites = await this.siteNames.forTrial(trialId);
    if (role === 'collaborator' && siteId === null) throw fieldError('siteId', 'siteId is required for a collaborator: choose the site they will run');
    if (role === 'collaborator' && !sites.has(siteId as number)) throw fieldError('siteId', 'site must be one of this trial’s sites');
    if (role !== 'collaborator' && siteId !== null) throw fieldError('siteId', 'site is chosen only for a collaborator: leave it out for a reviewer or an investigator');

    const user = await this.users.findOne({ where: { email } });
    if (user && (await this.members.holdsPlace(trialId, user.id, role, siteId))) {
      throw new ConflictException(`${email} is already ${role === 'investigator' ? 'an' : 'a'} ${role}${siteId ? ` at ${sites.get(siteId)}` : ''} on this trial.`);
    }
    const open = await this.invitations.findOne({
      where: { trialId, email, role, siteId, acceptedAt: null, revokedAt: null, expiresAt: { [Op.gt]: new Date() } },
    });
    if (open) throw new ConflictException(`${email} already has a pending invitation for this role; resend it instead of inviting again.`);

    const trial = await this.requireTrial(trialId);
    return this.sequelize.transaction(async (transaction) => {
      const { token, hash } = newInvitationToken();
      const sentAt = new Date();
      const row = await this.invitations.create(
        { trialId, email, role, siteId, message: input.message?.trim() || null, tokenHash: hash, invitedBy: inviter.id, sentAt, expiresAt: this.expiryFrom(sentAt) },
        { transaction },
      );
      await this.activity.record(transaction, {
        trialId,
        userId: inviter.id,
        kind: 'invitation.sent',
        siteId,
        summary: `Invited ${email} as ${role}${siteId ? ` at ${sites.get(siteId)}` : ''}.`,
        details: { invitationId: row.id, email, role, siteId },
      });
      // Sent last, inside the transaction: if the mail server refuses, no invitation is left behind.
      await this.sendInvitation(row, trial, inviter.name, sites, token);
      row.inviter = { name: inviter.name } as User;
      return this.toInvitation(row, sites, new Date());
    });
  }

  /** A new link (and a new expiry) for an unanswered invitation; the old link stops working. */
  async resend(trialId: number, actor: AuthUser, invitationId: number): Promise<Invitation> {
    const trial = await this.requireTrial(trialId);
    const sites = await this.siteNames.forTrial(trialId);
    return this.sequelize.transaction(async (transaction) => {
      const row = await this.requireInvitation(trialId, invitationId, transaction);
      const status = invitationStatus(row, new Date());
      if (status === 'accepted' || status === 'revoked') {
        throw new ConflictException(`This invitation was ${status === 'accepted' ? 'already accepted' : 'withdrawn'}, so it cannot be resent.`);
      }
      const { token, hash } = newInvitationToken();
      row.tokenHash = hash;
      row.sentAt = new Date();
      row.expiresAt = this.expiryFrom(row.sentAt);
      await row.save({ transaction });
      await this.activity.record(transaction, {
        trialId,
        userId: actor.id,
        kind: 'invitation.resent',
        siteId: row.siteId,
        summary: `Sent the invitation to ${row.email} again; the earlier link no longer works.`,
        details: { invitationId: row.id, email: row.email },
      });
      await this.sendInvitation(row, trial, row.inviter?.name ?? actor.name, sites, token);
      return this.toInvitation(row, sites, new Date());
    });
  }

  /** Withdraws an unanswered invitation; its link then answers 410. */
  async revoke(trialId: number, actor: AuthUser, invitationId: number): Promise<Invitation> {
    const sites = await this.siteNames.forTrial(trialId);
    return this.sequelize.transaction(async (transaction) => {
      const row = await this.requireInvitation(trialId, invitationId, transaction);
      const status = invitationStatus(row, new Date());
      if (status === 'accepted') throw new ConflictException(`${row.email} has already accepted this invitation and is on the team.`);
      if (status !== 'revoked') {
        row.revokedAt = new Date();
        await row.save({ transaction });
        await this.activity.record(transaction, {
          trialId,
          userId: actor.id,
          kind: 'invitation.revoked',
          siteId: row.siteId,
          summary: `Withdrew the invitation to ${row.email}.`,
          details: { invitationId: row.id, email: row.email },
        });
      }
      return this.toInvitation(row, sites, new Date());
    });
  }

  /** What a still-usable link invites its holder to. */
  async preview(token: string): Promise<InvitationPreview> {
    const row = await this.usableInvitation(token);
    const [trial, sites, account] = await Promise.all([
      this.requireTrial(row.trialId),
      this.siteNames.forTrial(row.trialId),
      this.users.count({ where: { email: row.email } }),
    ]);
    return {
      trialCode: trial.code,
      trialTitle: trial.title,
      role: row.role,
      siteName: row.siteId === null ? null : (sites.get(row.siteId) ?? null),
      email: row.email,
      invitedByName: row.inviter?.name ?? null,
      accountExists: account > 0,
      expiresAt: row.expiresAt.toISOString(),
    };
  }

  /**
   * Accepts an invitation once: with the invited person's bearer token, the password of their existing
   * account, or a name and password for a new account. The membership, the used link and the activity
   * entry are written together; the answer signs the person in.
   */
  async accept(
    token: string,
    input: AcceptInvitationDto,
    caller: AuthUser | null,
    client: { address: string; userAgent?: string },
  ): Promise<{ created: boolean; started: StartedSession; response: InvitationAcceptResponse }> {
    return this.sequelize.transaction(async (transaction) => {
      // Locked so two simultaneous uses of one link cannot both succeed.
      const row = await this.usableInvitation(token, transaction);
      const { user, created } = await this.accountFor(row, input, caller, client, transaction);
      const [membership] = await this.memberships.findOrCreate({
        where: { trialId: row.trialId, userId: user.id, role: row.role, siteId: row.siteId },
        defaults: { trialId: row.trialId, userId: user.id, role: row.role, siteId: row.siteId },
        transaction,
      });
      row.acceptedAt = new Date();
      row.acceptedBy = user.id;
      await row.save({ transaction });
      const siteName = row.siteId === null ? null : ((await this.siteNames.forTrial(row.trialId, transaction)).get(row.siteId) ?? null);
      await this.activity.record(transaction, {
        trialId: row.trialId,
        userId: user.id,
        kind: 'invitation.accepted',
        siteId: row.siteId,
        summary: `${user.name} joined as ${row.role}${siteName ? ` at ${siteName}` : ''}${created ? ' with a new account' : ''}.`,
        details: { invitationId: row.id, membershipId: membership.id, role: row.role, siteId: row.siteId, newAccount: created },
      });
      user.lastSignInAt = new Date();
      await user.save({ transaction });
      const started = await this.sessions.start(user, client, transaction);
      return {
        created,
        started,
        response: { accessToken: started.accessToken, tokenType: 'Bearer', expiresIn: started.expiresIn, user: toPublicUser(user), trialId: row.trialId },
      };
    });
  }

  private async accountFor(row: TrialInvitation, input: AcceptInvitationDto, caller: AuthUser | null, client: { address: string }, transaction: Transaction) {
    if (caller && caller.email.toLowerCase() === row.email) {
      return { user: await this.users.findByPk(caller.id, { transaction, rejectOnEmpty: true }), created: false };
    }
    const existing = await this.users.findOne({ where: { email: row.email }, transaction });
    if (existing) {
      if (!input.password) {
        if (caller) throw new ForbiddenException(`This invitation is for ${row.email}, but you are signed in as ${caller.email}. Enter the password of ${row.email} instead.`);
        throw fieldError('password', `password of the Friable account ${row.email} is required`);
      }
      // 403, not 401: a wrong password here must not end the session of whoever is signed in on this browser.
      // Counted like a sign-in, so an invitation link cannot be used to guess the account's password.
      await this.lockout.admit(row.email, client.address);
      if (!(await this.hasher.matches(input.password, existing.passwordHash))) {
        throw new ForbiddenException(`The password is not right for the Friable account ${row.email}.`);
      }
      await this.lockout.succeeded(row.email, client.address);
      if (!existing.isActive) throw new ForbiddenException(`The account ${row.email} is deactivated; ask the administrator to reactivate it.`);
      return { user: existing, created: false };
    }
    const name = input.name?.trim() ?? '';
    const weak = passwordProblem(input.password ?? '', { email: row.email, name });
    const errors = [...(name === '' ? [{ field: 'name', message: 'name must not be empty' }] : []), ...(weak ? [{ field: 'password', message: weak }] : [])];
    if (errors.length) throw new UnprocessableEntityException({ message: `Please correct: ${errors.map((e) => e.message).join('; ')}.`, errors });
    const user = await this.users.create(
      { email: row.email, name, passwordHash: await this.hasher.hash(input.password as string), isAdmin: false, isActive: true },
      { transaction },
    );
    return { user, created: true };
  }

  private async usableInvitation(token: string, transaction?: Transaction): Promise<TrialInvitation> {
    if (!/^[A-Za-z0-9_-]{16,128}$/.test(token)) throw new InvitationNotFoundException();
    const row = await this.invitations.findOne({
      where: { tokenHash: hashInvitationToken(token) },
      include: [{ model: User, attributes: ['id', 'name'] }],
      transaction,
      lock: transaction ? transaction.LOCK.UPDATE : undefined,
    });
    if (!row) throw new InvitationNotFoundException();
    const status = invitationStatus(row, new Date());
    if (status !== 'pending') throw new InvitationGoneException(status, row.expiresAt);
    return row;
  }

  private async requireInvitation(trialId: number, invitationId: number, transaction: Transaction): Promise<TrialInvitation> {
    const row = await this.invitations.findOne({
      where: { id: invitationId, trialId },
      include: [{ model: User, attributes: ['id', 'name'] }],
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!row) throw new NotFoundException(`This trial has no invitation ${invitationId}.`);
    return row;
  }

  private async requireTrial(trialId: number): Promise<Trial> {
    const trial = await this.trials.findByPk(trialId);
    if (!trial) throw new NotFoundException('No such trial.');
    return trial;
  }

  private expiryFrom(sentAt: Date): Date {
    return new Date(sentAt.getTime() + this.mailSettings.invitationTtlHours * 3600_000);
  }

  private sendInvitation(row: TrialInvitation, trial: Trial, inviterName: string | null, sites: Map<number, string>, token: string) {
    return this.mail.send(
      invitationEmail({
        to: row.email,
        inviterName,
        trialCode: trial.code,
        trialTitle: trial.title,
        role: row.role,
        siteName: row.siteId === null ? null : (sites.get(row.siteId) ?? null),
        message: row.message,
        link: `${this.mailSettings.appUrl}/invitations/${token}`,
        expiresAt: row.expiresAt,
      }),
    );
  }

  private toInvitation(row: TrialInvitation, sites: Map<number, string>, now: Date): Invitation {
    return {
      id: row.id,
      email: row.email,
      role: row.role,
      siteId: row.siteId,
      siteName: row.siteId === null ? null : (sites.get(row.siteId) ?? null),
      invitedByName: row.inviter?.name ?? null,
      sentAt: row.sentAt.toISOString(),
      expiresAt: row.expiresAt.toISOString(),
      status: invitationStatus(row, now),
    };
  }
}
