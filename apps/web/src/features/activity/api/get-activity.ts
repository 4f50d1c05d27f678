import type { ActivityEntry } from '@friable/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** The server-side filters of the activity list; each left out means "any". */
export interface ActivityFilter {
  /** One exact kind, e.g. 'site.randomized'. */
  kind?: string;
  siteId?: number;
  userId?: number;
}

/** The query string for a filter: `?kind=site.randomized&siteId=3&userId=7`, or '' for everything. */
export function activityQueryString(filter: ActivityFilter): string {
  const query = new URLSearchParams();
  if (filter.kind) query.set('kind', filter.kind);
  if (filter.siteId) query.set('siteId', String(filter.siteId));
  if (filter.userId) query.set('userId', String(filter.userId));
  const text = query.toString();
  return text ? `?${text}` : '';
}

/** GET /api/trials/:trialId/activity?kind=&siteId=&userId= — the trial's audit trail, newest first (at most 1,000 entries). */
export function getActivity(trialId: number, filter: ActivityFilter): Promise<ActivityEntry[]> {
  return apiRequest<ActivityEntry[]>(`/trials/${trialId}/activity${activityQueryString(filter)}`);
}

/** Under the trial's key, so every change that reloads the trial reloads its activity too. */
export const activityQueryOptions = (trialId: number, filter: ActivityFilter) =>
  queryOptions({ queryKey: ['trials', trialId, 'activity', filter], queryFn: () => getActivity(trialId, filter) });

export function useActivity(trialId: number, filter: ActivityFilter) {
  return useQuery({ ...activityQueryOptions(trialId, filter), placeholderData: keepPreviousData });
}
