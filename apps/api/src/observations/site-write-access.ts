import { ForbiddenException } from '@nestjs/common';
import type { TrialAccessContext } from '../common/auth-user';

/**
 * Site write access — refuses a write for a site the caller may not write for.
 *
 * Purpose: investigators write everywhere in their trial; collaborators only for the sites they are
 * assigned to (TrialAccessContext.siteIds); reviewers and read-only administrators never (the route's
 * @TrialAccess already keeps them out; this is the second line).
 * Throws: ForbiddenException (403) naming the site.
 * Example: `assertMayWriteSite({ roles: ['collaborator'], siteIds: [2], … }, 3, 'Quarry Hill Garden')` throws
 * "You collaborate on other sites of this trial; only its investigators and Quarry Hill Garden's collaborators may record data there."
 */
export function assertMayWriteSite(access: TrialAccessContext, siteId: number, siteName: string): void {
  if (access.adminReadOnly) throw new ForbiddenException('Administrators without a role on this trial may read it only.');
  if (access.roles.includes('investigator')) return;
  if (access.roles.includes('collaborator') && access.siteIds.includes(siteId)) return;
  if (access.roles.includes('collaborator')) {
    throw new ForbiddenException(`You collaborate on other sites of this trial; only its investigators and ${siteName}'s collaborators may record data there.`);
  }
  throw new ForbiddenException('Reviewers read this trial only; they do not record data.');
}
