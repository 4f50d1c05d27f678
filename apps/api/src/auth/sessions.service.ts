import { Inject, Injectable, UnauthorizedException } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { JwtService } from '@nestjs/jwt';
import { InjectModel } from '@nestjs/sequelize';
import type { Request, Response } from 'express';
import { createHash, randomBytes, randomUUID } from 'node:crypto';
import { Op, type Transaction } from 'sequelize';
import { authConfig } from '../config/auth.config';
import { User } from '../users/models/user.model';
import type { AuthUser } from '../common/auth-user';
import { UserSession } from './models/user-session.model';
import { SESSION_COOKIE, sessionCookieOptions } from './session-cookie';

/** What an access token carries: the person and the session it belongs to. */
export interface AccessPayload {
  sub: number;
  sid: string;
  exp?: number;
}

export interface StartedSession {
  accessToken: string;
  tokenType: 'Bearer';
  expiresIn: number;
  /** The cookie's secret; only its hash is stored. */
  secret: string;
  session: UserSession;
}

const hashSecret = (secret: string) => createHash('sha256').update(secret, 'utf8').digest('hex');
const ENDED = 'Your session has ended. Please sign in again.';
// last_used_at is written at most this often per session, so reads stay reads.
const TOUCH_INTERVAL_MS = 60_000;

/**
 * Sign-in sessions — one revocable row per sign-in. Browsers hold its secret in an httpOnly cookie; API
 * clients hold a short-lived access token (JWT, HS256, with iss, aud and exp) naming the session. Both are
 * checked against the row on every request, so ending a session takes effect on the next request.
 */
@Injectable()
export class SessionsService {
  constructor(
    @InjectModel(UserSession) private readonly sessions: typeof UserSession,
    private readonly jwt: JwtService,
    @Inject(authConfig.KEY) private readonly config: ConfigType<typeof authConfig>,
  ) {}

  async start(user: User, meta: { userAgent?: string; address?: string }, transaction?: Transaction): Promise<StartedSession> {
    const secret = randomBytes(32).toString('base64url');
    const now = new Date();
    const session = await this.sessions.create(
      {
        id: randomUUID(),
        userId: user.id,
        secretHash: hashSecret(secret),
        lastUsedAt: now,
        expiresAt: new Date(now.getTime() + this.config.sessionTtlHours * 3600_000),
        userAgent: meta.userAgent?.slice(0, 200) ?? null,
        address: meta.address?.slice(0, 64) ?? null,
      },
      { transaction },
    );
    const accessToken = await this.jwt.signAsync({ sub: user.id, sid: session.id }, { expiresIn: this.config.tokenTtlSeconds });
    return { accessToken, tokenType: 'Bearer', expiresIn: this.config.tokenTtlSeconds, secret, session };
  }

  /** The person behind a verified access token, if its session is still open. */
  async userForAccessToken(payload: AccessPayload): Promise<AuthUser> {
    if (typeof payload.exp !== 'number' || typeof payload.sid !== 'string' || !Number.isInteger(payload.sub)) throw new UnauthorizedException(ENDED);
    const session = await this.sessions.findByPk(payload.sid, { include: [User] });
    if (!session || session.userId !== payload.sub) throw new UnauthorizedException(ENDED);
    return this.open(session);
  }

  /** The person behind a session cookie's secret, if its session is still open. */
  async userForCookie(secret: string): Promise<AuthUser> {
    if (!/^[A-Za-z0-9_-]{20,100}$/.test(secret)) throw new UnauthorizedException(ENDED);
    const session = await this.sessions.findOne({ where: { secretHash: hashSecret(secret) }, include: [User] });
    if (!session) throw new UnauthorizedException(ENDED);
    return this.open(session);
  }

  /** The signed-in person on a public route (bearer token or cookie), or null; never throws. */
  async optionalUser(request: Request): Promise<AuthUser | null> {
    try {
      const bearer = /^Bearer\s+(\S+)$/i.exec(request.headers.authorization ?? '')?.[1];
      if (bearer) return await this.userForAccessToken(await this.jwt.verifyAsync<AccessPayload>(bearer));
      const secret = (request.cookies as Record<string, string> | undefined)?.[SESSION_COOKIE];
      return secret ? await this.userForCookie(secret) : null;
    } catch {
      return null;
    }
  }

  async revoke(sessionId: string, reason: string): Promise<void> {
    await this.sessions.update({ revokedAt: new Date(), revokedReason: reason }, { where: { id: sessionId, revokedAt: null } });
  }

  /** Ends every open session of the person; answers how many were open. */
  async revokeAll(userId: number, reason: string, transaction?: Transaction): Promise<number> {
    const [count] = await this.sessions.update({ revokedAt: new Date(), revokedReason: reason }, { where: { userId, revokedAt: null }, transaction });
    return count;
  }

  /** Ends every open session of the person but the one in use (after a password change). */
  async revokeAllExcept(userId: number, keepSessionId: string, reason: string, transaction?: Transaction): Promise<number> {
    const [count] = await this.sessions.update(
      { revokedAt: new Date(), revokedReason: reason },
      { where: { userId, revokedAt: null, id: { [Op.ne]: keepSessionId } }, transaction },
    );
    return count;
  }

  /** Sets the browser's session cookie on a sign-in answer. */
  setCookie(response: Response, started: StartedSession): void {
    response.cookie(SESSION_COOKIE, started.secret, sessionCookieOptions(this.config.secureCookie, started.session.expiresAt.getTime() - Date.now()));
  }

  clearCookie(response: Response): void {
    response.clearCookie(SESSION_COOKIE, sessionCookieOptions(this.config.secureCookie));
  }

  private async open(session: UserSession): Promise<AuthUser> {
    const now = Date.now();
    const user = session.user;
    const idleLimit = session.lastUsedAt.getTime() + this.config.sessionIdleHours * 3600_000;
    if (!user || !user.isActive || session.revokedAt || session.expiresAt.getTime() <= now || idleLimit <= now) {
      throw new UnauthorizedException(ENDED);
    }
    if (now - session.lastUsedAt.getTime() > TOUCH_INTERVAL_MS) {
      await this.sessions.update({ lastUsedAt: new Date(now) }, { where: { id: session.id, lastUsedAt: { [Op.lt]: new Date(now - TOUCH_INTERVAL_MS) } } });
    }
    return { id: user.id, email: user.email, name: user.name, isAdmin: user.isAdmin, sessionId: session.id };
  }
}
