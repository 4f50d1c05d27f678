import type { AccountNotice, LoginResponse, SessionsEnded } from '@friable/contracts';
import { ForbiddenException, Inject, Injectable, NotFoundException, UnauthorizedException } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { Op } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { authConfig } from '../config/auth.config';
import { mailConfig } from '../config/mail.config';
import { FieldProblemsException } from '../common/exceptions/field-problems.exception';
import { MailService } from '../mail/mail.service';
import { User } from '../users/models/user.model';
import { toPublicUser, type PublicUser } from '../users/public-user';
import type { AuthUser } from '../common/auth-user';
import { PasswordReset } from './models/password-reset.model';
import { PasswordHasher } from './password-hasher.service';
import { passwordProblem } from './password-policy';
import { passwordResetEmail } from './password-reset-email';
import { hashLinkSecret, newLinkSecret } from '../common/link-secret';
import { PasswordLinkGoneException } from './password-link-gone.exception';
import { SessionsService, type StartedSession } from './sessions.service';
import { SignInLockoutService } from './sign-in-lockout.service';

export interface ClientFacts {
  address: string;
  userAgent?: string;
}

const RESET_ANSWER = (minutes: number) =>
  `If a Friable account has this address, we have e-mailed it a link to choose a new password. The link works once, for ${minutes} minutes.`;

/** Sign-in, sign-out, password changes and forgotten-password links. */
@Injectable()
export class AuthService {
  constructor(
    @InjectModel(User) private readonly users: typeof User,
    @InjectModel(PasswordReset) private readonly resets: typeof PasswordReset,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly hasher: PasswordHasher,
    private readonly sessions: SessionsService,
    private readonly lockout: SignInLockoutService,
    private readonly mail: MailService,
    @Inject(authConfig.KEY) private readonly config: ConfigType<typeof authConfig>,
    @Inject(mailConfig.KEY) private readonly mailSettings: ConfigType<typeof mailConfig>,
  ) {}

  async login(email: string, password: string, client: ClientFacts): Promise<{ started: StartedSession; answer: LoginResponse }> {
    const normalized = email.trim().toLowerCase();
    await this.lockout.admit(normalized, client.address);
    const user = await this.users.findOne({ where: { email: normalized } });
    if (!(await this.hasher.matches(password, user?.passwordHash)) || !user) {
      throw new UnauthorizedException('The e-mail or password is not right.');
    }
    if (!user.isActive) throw new UnauthorizedException('This account is deactivated. Ask your Friable administrator to reactivate it.');
    await this.lockout.succeeded(normalized, client.address);
    if (this.hasher.needsRehash(user.passwordHash)) user.passwordHash = await this.hasher.hash(password);
    user.lastSignInAt = new Date();
    await user.save();
    const started = await this.sessions.start(user, client);
    return { started, answer: { accessToken: started.accessToken, tokenType: 'Bearer', expiresIn: started.expiresIn, user: toPublicUser(user) } };
  }

  async me(userId: number): Promise<PublicUser> {
    const user = await this.users.findByPk(userId);
    if (!user) throw new UnauthorizedException('Your session has ended. Please sign in again.');
    return toPublicUser(user);
  }

  async logout(caller: AuthUser): Promise<AccountNotice> {
    if (caller.sessionId) await this.sessions.revoke(caller.sessionId, 'signed-out');
    return { message: 'You are signed out.' };
  }

  async logoutEverywhere(caller: AuthUser): Promise<SessionsEnded> {
    const count = await this.sessions.revokeAll(caller.id, 'signed-out-everywhere');
    return { message: `You are signed out everywhere (${count} session${count === 1 ? '' : 's'} ended).`, sessionsEnded: count };
  }

  /** Changes one's own password; the current one is required, and every other session ends. */
  async changePassword(caller: AuthUser, currentPassword: string, newPassword: string, client: ClientFacts): Promise<AccountNotice> {
    const user = await this.users.findByPk(caller.id, { rejectOnEmpty: true });
    // A wrong current password counts like a failed sign-in, so a borrowed session cannot guess it.
    await this.lockout.admit(user.email, client.address);
    if (!(await this.hasher.matches(currentPassword, user.passwordHash))) {
      throw new ForbiddenException('The current password is not right, so the password was not changed.');
    }
    await this.lockout.succeeded(user.email, client.address);
    this.assertAcceptable(newPassword, user, 'newPassword');
    await this.sequelize.transaction(async (transaction) => {
      await user.update({ passwordHash: await this.hasher.hash(newPassword), passwordChangedAt: new Date() }, { transaction });
      await this.sessions.revokeAllExcept(user.id, caller.sessionId ?? '', 'password-changed', transaction);
    });
    return { message: 'Your password is changed. Your other sessions were signed out.' };
  }

  /** E-mails a single-use link to an active account with this address; the answer is the same either way. */
  async requestReset(email: string): Promise<AccountNotice> {
    const ttl = this.config.passwordResetTtlMinutes;
    const user = await this.users.findOne({ where: { email: email.trim().toLowerCase(), isActive: true } });
    if (user) {
      const { token, hash } = newLinkSecret();
      const expiresAt = new Date(Date.now() + ttl * 60_000);
      await this.resets.create({ userId: user.id, tokenHash: hash, expiresAt });
      const link = `${this.mailSettings.appUrl}/reset-password/${token}`;
      // Sent without waiting, so the answer takes no longer for an account's address than for any other and
      // so does not tell whether the account exists; a mail failure is logged by MailService.
      void this.mail.send(passwordResetEmail({ to: user.email, name: user.name, link, expiresAt, ttlMinutes: ttl, locale: user.locale })).catch(() => undefined);
    }
    return { message: RESET_ANSWER(ttl) };
  }

  /** Sets the new password from a reset link (once, before it expires) and ends every session of the account. */
  async confirmReset(token: string, password: string): Promise<AccountNotice> {
    if (!/^[A-Za-z0-9_-]{20,100}$/.test(token)) throw new NotFoundException('This password-reset link is not valid. Ask for a new one on the sign-in page.');
    return this.sequelize.transaction(async (transaction) => {
      const reset = await this.resets.findOne({ where: { tokenHash: hashLinkSecret(token) }, include: [User], transaction, lock: transaction.LOCK.UPDATE });
      if (!reset || !reset.user) throw new NotFoundException('This password-reset link is not valid. Ask for a new one on the sign-in page.');
      if (reset.usedAt) throw new PasswordLinkGoneException('This password-reset link was already used. Ask for a new one if you need to.');
      if (reset.expiresAt.getTime() <= Date.now()) throw new PasswordLinkGoneException('This password-reset link has expired. Ask for a new one on the sign-in page.');
      if (!reset.user.isActive) throw new PasswordLinkGoneException('This account is deactivated. Ask your Friable administrator to reactivate it.');
      this.assertAcceptable(password, reset.user, 'password');
      const now = new Date();
      await reset.update({ usedAt: now }, { transaction });
      // Every other open link of the account stops working too.
      await this.resets.update({ usedAt: now }, { where: { userId: reset.userId, usedAt: null, id: { [Op.ne]: reset.id } }, transaction });
      await reset.user.update({ passwordHash: await this.hasher.hash(password), passwordChangedAt: now }, { transaction });
      await this.sessions.revokeAll(reset.userId, 'password-reset', transaction);
      await this.lockout.clearAccount(reset.user.email);
      return { message: 'Your new password is set, and every earlier session was signed out. Sign in with the new password.' };
    });
  }

  private assertAcceptable(password: string, user: User, field: string): void {
    const problem = passwordProblem(password, { email: user.email, name: user.name });
    if (problem) throw new FieldProblemsException([{ field, message: problem }], problem);
  }
}
