import { Inject, Injectable } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { PassportStrategy } from '@nestjs/passport';
import { createSecretKey } from 'node:crypto';
import { Strategy } from 'passport-jwt';
import { authConfig } from '../../config/auth.config';
import type { AuthenticatedRequest, AuthUser } from '../../common/auth-user';
import { SessionsService, type AccessPayload } from '../sessions.service';
import { bearerTokenOf, VerifiedTokens } from '../verified-tokens';

/**
 * Checks a bearer access token: HS256 only, issuer and audience required, not expired (exp required too),
 * and its session still open, so a deactivated, reset or signed-out-everywhere account stops at once.
 */
@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(
    @Inject(authConfig.KEY) config: ConfigType<typeof authConfig>,
    private readonly sessions: SessionsService,
    private readonly verified: VerifiedTokens,
  ) {
    super({
      jwtFromRequest: bearerTokenOf,
      ignoreExpiration: false,
      // A key object made once: given the text, jsonwebtoken tries it as a public key and then makes a secret key
      // from it on every request, a sixth of an authenticated request's processor time.
      secretOrKey: createSecretKey(Buffer.from(config.jwtSecret, 'utf8')) as unknown as string,
      algorithms: ['HS256'],
      issuer: config.jwtIssuer,
      audience: config.jwtAudience,
      // The request keeps the access stamp read for its session check, which its trial-role check reuses.
      passReqToCallback: true,
    });
  }

  async validate(request: AuthenticatedRequest, payload: AccessPayload): Promise<AuthUser> {
    const user = await this.sessions.userForAccessToken(payload, request);
    // Checked and its session open: the guard takes the same token's next requests from here (verified-tokens.ts).
    const token = bearerTokenOf(request);
    if (token) this.verified.remember(token, payload);
    return user;
  }
}
