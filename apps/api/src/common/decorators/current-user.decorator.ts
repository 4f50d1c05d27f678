import { createParamDecorator, type ExecutionContext } from '@nestjs/common';
import type { AuthenticatedRequest, AuthUser, TrialAccessContext } from '../auth-user';

/** The signed-in person, as the JWT strategy loaded them for this request. */
export const CurrentUser = createParamDecorator((_data: unknown, context: ExecutionContext): AuthUser => {
  return context.switchToHttp().getRequest<AuthenticatedRequest>().user;
});

/** The caller's roles on the route's trial, as the access guard found them. */
export const CurrentTrialAccess = createParamDecorator((_data: unknown, context: ExecutionContext): TrialAccessContext => {
  const access = context.switchToHttp().getRequest<AuthenticatedRequest>().trialAccess;
  if (!access) throw new Error('CurrentTrialAccess used on a route without @TrialAccess');
  return access;
});
