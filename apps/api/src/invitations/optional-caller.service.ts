import { Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { InjectModel } from '@nestjs/sequelize';
import type { Request } from 'express';
import type { AuthUser } from '../auth/auth-user';
import { User } from '../users/models/user.model';

/**
 * The signed-in person on a public route, if the request carries a valid bearer token; otherwise null.
 * A stale or foreign token is ignored rather than refused, because the accept page is opened by people
 * who may not be signed in as the invited person.
 */
@Injectable()
export class OptionalCallerService {
  constructor(
    private readonly jwt: JwtService,
    @InjectModel(User) private readonly users: typeof User,
  ) {}

  async from(request: Request): Promise<AuthUser | null> {
    const match = /^Bearer\s+(\S+)$/i.exec(request.headers.authorization ?? '');
    if (!match) return null;
    try {
      const payload = await this.jwt.verifyAsync<{ sub: number }>(match[1]);
      const user = await this.users.findByPk(payload.sub);
      if (!user || !user.isActive) return null;
      return { id: user.id, email: user.email, name: user.name, isAdmin: user.isAdmin };
    } catch {
      return null;
    }
  }
}
