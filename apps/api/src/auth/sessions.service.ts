import { Inject, Injectable, UnauthorizedException } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { JwtService } from '@nestjs/jwt';
import { InjectModel } from '@nestjs/sequelize';
import type { Request, Response } from 'express';
import { LRUCache } from 'lru-cache';
import { createHash, randomBytes, randomUUID } from 'node:crypto';
import { Op, type Transaction } from 'sequelize';
import { authConfig } from '../config/auth.config';
import { DataStampsService } from '../data-stamps/data-stamps.service';
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
/** How long an open session is kept in memory at most, even while the access stamp stays the same. */
export const KEPT_SESSION_MS = 20_000;

/** An open session as last read from its row, with the access stamp read before that row. */
interface KeptSession {
  stamp: string;
  sessionId: string;
  userId: number;
  expiresAt: number;
  lastUsedAt: number;
  user: AuthUser;
}

/** Where a request keeps its access stamp read (DataStampsService.accessStampOf). */
type StampHolder = { accessStamp?: Promise<string> };

/**
 * Sign-in sessions — one revocable row per sign-in. Browsers hold its secret in an httpOnly cookie; API
 * clients hold a short-lived access token (JWT, HS256, with iss, aud and exp) naming the session.
 *
 * An open session read from its row is kept in memory (at most KEPT_SESSION_MS) with the access stamp read
 * before the row, and is trusted only while each request's own read of that stamp (one primary-key read,
 * shared by concurrent requests) finds it unchanged. Every change of access moves the stamp before it is
 * answered — ending sessions here, deactivating or changing an account and changing a membership through
 * model hooks (data-stamps/access-stamp-hook.ts) — so ending a session still takes effect on the next
 * request, on every API instance. Should moving the stamp fail (logged), other instances notice within
 * KEPT_SESSION_MS; this instance forgets the ended sessions at once.
 */
@Injectable()
export class SessionsService {
  private readonly kept = new LRUCache<string, KeptSession>({ max: 20_000, ttl: KEPT_SESSION_MS });

  constructor(
    @InjectModel(UserSession) private readonly sessions: typeof UserSession,
    private readonly jwt: JwtService,
    @Inject(authConfig.KEY) private readonly config: ConfigType<typeof authConfig>,
    private readonly stamps: DataStampsService,
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

  /**
   * The person behind a verified access token, if its session is still open. `request` keeps the access
   * stamp read for the request's other checks (the trial roles).
   */
  async userForAccessToken(payload: AccessPayload, request: StampHolder = {}): Promise<AuthUser> {
    if (typeof payload.exp !== 'number' || typeof payload.sid !== 'string' || !Number.isInteger(payload.sub)) throw new UnauthorizedException(ENDED);
    const key = `sid:${payload.sid}`;
    const stamp = await this.stamps.accessStampOf(request);
    const kept = this.kept.get(key);
    if (kept && kept.stamp === stamp && kept.userId === payload.sub) return this.openKept(kept);
    const session = await this.sessions.findByPk(payload.sid, { include: [User] });
    if (!session || session.userId !== payload.sub) throw new UnauthorizedException(ENDED);
    return this.keep(key, stamp, session);
  }

  /** The person behind a session cookie's secret, if its session is still open. */
  async userForCookie(secret: string, request: StampHolder = {}): Promise<AuthUser> {
    if (!/^[A-Za-z0-9_-]{20,100}$/.test(secret)) throw new UnauthorizedException(ENDED);
    const secretHash = hashSecret(secret);
    const key = `cookie:${secretHash}`;
    const stamp = await this.stamps.accessStampOf(request);
    const kept = this.kept.get(key);
    if (kept && kept.stamp === stamp) return this.openKept(kept);
    const session = await this.sessions.findOne({ where: { secretHash }, include: [User] });
    if (!session) throw new UnauthorizedException(ENDED);
    return this.keep(key, stamp, session);
  }

  /** The signed-in person on a public route (bearer token or cookie), or null; never throws. */
  async optionalUser(request: Request & StampHolder): Promise<AuthUser | null> {
    try {
      const bearer = /^Bearer\s+(\S+)$/i.exec(request.headers.authorization ?? '')?.[1];
      if (bearer) return await this.userForAccessToken(await this.jwt.verifyAsync<AccessPayload>(bearer), request);
      const secret = (request.cookies as Record<string, string> | undefined)?.[SESSION_COOKIE];
      return secret ? await this.userForCookie(secret, request) : null;
    } catch {
      return null;
    }
  }

  async revoke(sessionId: string, reason: string): Promise<void> {
    await this.sessions.update({ revokedAt: new Date(), revokedReason: reason }, { where: { id: sessionId, revokedAt: null } });
    this.forget((kept) => kept.sessionId === sessionId);
    await this.stamps.touchAccess();
  }

  /** Ends every open session of the person; answers how many were open. */
  async revokeAll(userId: number, reason: string, transaction?: Transaction): Promise<number> {
    const [count] = await this.sessions.update({ revokedAt: new Date(), revokedReason: reason }, { where: { userId, revokedAt: null }, transaction });
    this.forget((kept) => kept.userId === userId);
    await this.stamps.touchAccess(transaction);
    return count;
  }

  /** Ends every open session of the person but the one in use (after a password change). */
  async revokeAllExcept(userId: number, keepSessionId: string, reason: string, transaction?: Transaction): Promise<number> {
    const [count] = await this.sessions.update(
      { revokedAt: new Date(), revokedReason: reason },
      { where: { userId, revokedAt: null, id: { [Op.ne]: keepSessionId } }, transaction },
    );
    this.forget((kept) => kept.userId === userId && kept.sessionId !== keepSessionId);
    await this.stamps.touchAccess(transaction);
    return count;
  }

  /** Sets the browser's session cookie on a sign-in answer. */
  setCookie(response: Response, started: StartedSession): void {
    response.cookie(SESSION_COOKIE, started.secret, sessionCookieOptions(this.config.secureCookie, started.session.expiresAt.getTime() - Date.now()));
  }

  clearCookie(response: Response): void {
    response.clearCookie(SESSION_COOKIE, sessionCookieOptions(this.config.secureCookie));
  }

  /** Checks a session row just read, keeps it under the access stamp read before it, and answers its person. */
  private async keep(key: string, stamp: string, session: UserSession): Promise<AuthUser> {
    const user = session.user;
    if (!user || !user.isActive || session.revokedAt) throw new UnauthorizedException(ENDED);
    const kept: KeptSession = {
      stamp,
      sessionId: session.id,
      userId: user.id,
      expiresAt: session.expiresAt.getTime(),
      lastUsedAt: session.lastUsedAt.getTime(),
      user: Object.freeze({ id: user.id, email: user.email, name: user.name, isAdmin: user.isAdmin, sessionId: session.id }),
    };
    const person = await this.openKept(kept);
    this.kept.set(key, kept);
    return person;
  }

  /** Ends a session past its expiry or idle limit; records its use at most once per TOUCH_INTERVAL_MS. */
  private async openKept(kept: KeptSession): Promise<AuthUser> {
    const now = Date.now();
    const idleLimit = kept.lastUsedAt + this.config.sessionIdleHours * 3600_000;
    if (kept.expiresAt <= now || idleLimit <= now) throw new UnauthorizedException(ENDED);
    if (now - kept.lastUsedAt > TOUCH_INTERVAL_MS) {
      kept.lastUsedAt = now;
      await this.sessions.update({ lastUsedAt: new Date(now) }, { where: { id: kept.sessionId, lastUsedAt: { [Op.lt]: new Date(now - TOUCH_INTERVAL_MS) } } });
    }
    return kept.user;
  }

  /** Drops kept sessions at once on this instance (the access stamp tells the others). */
  private forget(ended: (kept: KeptSession) => boolean): void {
    const keys = [...this.kept.entries()].filter(([, kept]) => ended(kept)).map(([key]) => key);
    for (const key of keys) this.kept.delete(key);
  }
}
