import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';

/** The server-side filters of the activity list; each left out means "any". */
export interface ActivityFilter {
  /** One exact kind, e.g. 'site.randomized'. */
  kind?: string;
  siteId?: number;
  userId?: number;
}

/** GET /api/trials/:trialId/activity?kind=&siteId=&userId= — the trial's audit trail, newest first (at most 1,000 entries). */
export function getActivity(trialId: number, { kind, siteId, userId }: ActivityFilter) {
  const query = { kind: kind || undefined, siteId: siteId || undefined, userId: userId || undefined };
  return unwrap(api.GET('/api/trials/{trialId}/activity', { params: { path: { trialId }, query } }));
}

/** Under the trial's key, so every change that reloads the trial reloads its activity too. */
export const activityQueryOptions = (trialId: number, filter: ActivityFilter) =>
  queryOptions({ queryKey: ['trials', trialId, 'activity', filter], queryFn: () => getActivity(trialId, filter) });

export function useActivity(trialId: number, filter: ActivityFilter) {
  return useQuery({ ...activityQueryOptions(trialId, filter), placeholderData: keepPreviousData });
}
