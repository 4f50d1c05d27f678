import { ForbiddenException, Injectable, UnauthorizedException, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard } from '@nestjs/passport';
import { ACCESS_RULE, type AccessRule } from '../../common/decorators/access.decorator';
import type { AuthenticatedRequest } from '../../common/auth-user';
import { CSRF_HEADER, SESSION_COOKIE } from '../session-cookie';
import { SessionsService } from '../sessions.service';
import { bearerTokenOf, VerifiedTokens } from '../verified-tokens';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Requires a signed-in person on every route not marked @Public(): a bearer access token (API clients), or
 * else the browser's session cookie, in which case a request that changes something must carry the
 * X-Friable-CSRF header.
 */
@Injectable()
export class JwtAuthGuard extends AuthGuard('jwt') {
  constructor(
    private readonly reflector: Reflector,
    private readonly sessions: SessionsService,
    private readonly verified: VerifiedTokens,
  ) {
    super();
  }

  override async canActivate(context: ExecutionContext): Promise<boolean> {
    const rule = this.reflector.getAllAndOverride<AccessRule | undefined>(ACCESS_RULE, [context.getHandler(), context.getClass()]);
    if (rule?.kind === 'public') return true;
    const request = context.switchToHttp().getRequest<AuthenticatedRequest>();
    const cookie = (request.cookies as Record<string, string> | undefined)?.[SESSION_COOKIE];
    if (!request.headers.authorization && cookie) {
      request.user = await this.sessions.userForCookie(cookie, request);
      if (!SAFE_METHODS.has(request.method) && request.headers[CSRF_HEADER] !== '1') {
        throw new ForbiddenException('This request did not come from a Friable page (its X-Friable-CSRF header is missing), so it was refused. Reload the page and try again.');
      }
      return true;
    }
    // A token the strategy checked before (and not yet expired) goes straight to its session check.
    const token = request.headers.authorization ? bearerTokenOf(request) : null;
    const payload = token ? this.verified.payloadOf(token) : undefined;
    if (payload) {
      request.user = await this.sessions.userForAccessToken(payload, request);
      return true;
    }
    return (await super.canActivate(context)) as boolean;
  }

  override handleRequest<TUser>(error: unknown, user: TUser | false, info: unknown): TUser {
    if (error) throw error;
    if (!user) {
      const expired = info instanceof Error && info.name === 'TokenExpiredError';
      throw new UnauthorizedException(expired ? 'Your session has expired. Please sign in again.' : 'Please sign in to continue.');
    }
    return user;
  }
}
