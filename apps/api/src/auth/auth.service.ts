import { Inject, Injectable, UnauthorizedException } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { JwtService } from '@nestjs/jwt';
import { InjectModel } from '@nestjs/sequelize';
import bcrypt from 'bcryptjs';
import { authConfig } from '../config/auth.config';
import { User } from '../users/models/user.model';
import { toPublicUser, type PublicUser } from '../users/public-user';
import { LoginAttemptsService } from './login-attempts.service';

// Compared against when the e-mail is unknown, so both failures take the same time.
const PLACEHOLDER_HASH = bcrypt.hashSync('friable-placeholder-password', 10);

@Injectable()
export class AuthService {
  constructor(
    @InjectModel(User) private readonly users: typeof User,
    private readonly jwt: JwtService,
    private readonly attempts: LoginAttemptsService,
    @Inject(authConfig.KEY) private readonly config: ConfigType<typeof authConfig>,
  ) {}

  async login(email: string, password: string, address: string) {
    this.attempts.assertAllowed(address);
    const user = await this.users.findOne({ where: { email: email.trim().toLowerCase() } });
    const matches = await bcrypt.compare(password, user?.passwordHash ?? PLACEHOLDER_HASH);
    if (!user || !matches || !user.isActive) {
      this.attempts.recordFailure(address);
      throw new UnauthorizedException('The e-mail or password is not right.');
    }
    this.attempts.recordSuccess(address);
    const accessToken = await this.jwt.signAsync({ sub: user.id }, { expiresIn: this.config.tokenTtlSeconds });
    return { accessToken, tokenType: 'Bearer' as const, expiresIn: this.config.tokenTtlSeconds, user: toPublicUser(user) };
  }

  async me(userId: number): Promise<PublicUser> {
    const user = await this.users.findByPk(userId);
    if (!user) throw new UnauthorizedException('Your session has ended. Please sign in again.');
    return toPublicUser(user);
  }
}
