import { ForbiddenException, Injectable, NotFoundException, type CanActivate, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { ACCESS_RULE, type AccessRule } from '../../common/decorators/access.decorator';
import { TrialMembershipsService } from '../../trials/trial-memberships.service';
import type { AuthenticatedRequest } from '../../common/auth-user';

/** Applies each route's access rule after authentication; a route without a rule is refused. */
@Injectable()
export class AccessGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly memberships: TrialMembershipsService,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const rule = this.reflector.getAllAndOverride<AccessRule | undefined>(ACCESS_RULE, [context.getHandler(), context.getClass()]);
    if (!rule) throw new ForbiddenException('This route has no access rule, so it is closed.');
    if (rule.kind === 'public' || rule.kind === 'signed-in') return true;
    const request = context.switchToHttp().getRequest<AuthenticatedRequest>();
    if (rule.kind === 'admin') {
      if (!request.user.isAdmin) throw new ForbiddenException('Only an instance administrator may do this.');
      return true;
    }
    const trialId = Number(request.params.trialId);
    if (!Number.isInteger(trialId) || trialId < 1) throw new NotFoundException('No such trial.');
    const access = await this.memberships.accessFor(request.user, trialId, request);
    if (!access) throw new NotFoundException('No such trial.');
    if (access.adminReadOnly) {
      if (rule.adminMayRead && request.method === 'GET') {
        request.trialAccess = access;
        return true;
      }
      throw new ForbiddenException('Instance administrators can read every trial but change only trials they hold a role on.');
    }
    if (!access.roles.some((role) => rule.roles.includes(role))) {
      throw new ForbiddenException(`This needs the ${rule.roles.join(' or ')} role on this trial; you are ${access.roles.join(' and ')}.`);
    }
    request.trialAccess = access;
    return true;
  }
}
