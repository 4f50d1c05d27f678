import { SetMetadata, applyDecorators } from '@nestjs/common';
import type { TrialRole } from '@friable/contracts';
import { ApiBearerAuth, ApiForbiddenResponse, ApiNotFoundResponse, ApiParam, ApiUnauthorizedResponse } from '@nestjs/swagger';

export const ACCESS_RULE = 'friable:access-rule';

/** Who may call a route. Every route declares one; a route without a rule is refused (deny by default). */
export type AccessRule =
  | { kind: 'public' }
  | { kind: 'signed-in' }
  | { kind: 'admin' }
  | { kind: 'trial'; roles: readonly TrialRole[]; adminMayRead: boolean };

/** Anyone, without a token. */
export const Public = () => SetMetadata(ACCESS_RULE, { kind: 'public' } satisfies AccessRule);

/** Any signed-in, active person. */
export const SignedIn = () =>
  applyDecorators(
    SetMetadata(ACCESS_RULE, { kind: 'signed-in' } satisfies AccessRule),
    ApiBearerAuth(),
    ApiUnauthorizedResponse({ description: 'No valid token.' }),
  );

/** Instance administrators only. */
export const AdminOnly = () =>
  applyDecorators(
    SetMetadata(ACCESS_RULE, { kind: 'admin' } satisfies AccessRule),
    ApiBearerAuth(),
    ApiUnauthorizedResponse({ description: 'No valid token.' }),
    ApiForbiddenResponse({ description: 'Needs an instance administrator.' }),
  );

/**
 * Members of the trial named by the route's `:trialId` holding one of the roles.
 * Non-members get 404, as if the trial did not exist. Instance administrators may read (GET) every trial.
 */
export const TrialAccess = (...roles: TrialRole[]) =>
  applyDecorators(
    SetMetadata(ACCESS_RULE, { kind: 'trial', roles, adminMayRead: true } satisfies AccessRule),
    // The guard reads :trialId itself, so no handler declares it: documented here once.
    ApiParam({ name: 'trialId', type: Number, description: 'The trial.' }),
    ApiBearerAuth(),
    ApiUnauthorizedResponse({ description: 'No valid token.' }),
    ApiForbiddenResponse({ description: `Needs one of these roles on the trial: ${roles.join(', ')}.` }),
    ApiNotFoundResponse({ description: 'No such trial, or you are not a member of it.' }),
  );

/** Every role on the trial (investigator, collaborator, reviewer). */
export const AnyTrialMember = () => TrialAccess('investigator', 'collaborator', 'reviewer');
