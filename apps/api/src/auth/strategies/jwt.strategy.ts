import { Inject, Injectable, UnauthorizedException } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { PassportStrategy } from '@nestjs/passport';
import { InjectModel } from '@nestjs/sequelize';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { authConfig } from '../../config/auth.config';
import { User } from '../../users/models/user.model';
import type { AuthUser } from '../auth-user';

interface TokenPayload {
  sub: number;
}

/** Checks the bearer token and reloads the person, so a deactivated account stops working at once. */
@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(
    @Inject(authConfig.KEY) config: ConfigType<typeof authConfig>,
    @InjectModel(User) private readonly users: typeof User,
  ) {
    super({ jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(), ignoreExpiration: false, secretOrKey: config.jwtSecret });
  }

  async validate(payload: TokenPayload): Promise<AuthUser> {
    const user = await this.users.findByPk(payload.sub);
    if (!user || !user.isActive) {
      throw new UnauthorizedException('Your session has ended. Please sign in again.');
    }
    return { id: user.id, email: user.email, name: user.name, isAdmin: user.isAdmin };
  }
}
