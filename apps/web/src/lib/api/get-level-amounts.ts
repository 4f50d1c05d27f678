import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../api-client';

/** GET /api/trials/:trialId/level-amounts — each factor level's material per unit it goes on (a whole plot for a whole-plot factor), per site. */
export function getLevelAmounts(trialId: number) {
  return unwrap(api.GET('/api/trials/{trialId}/level-amounts', { params: { path: { trialId } } }));
}

export const levelAmountsQueryOptions = (trialId: number) => queryOptions({ queryKey: ['trials', trialId, 'level-amounts'], queryFn: () => getLevelAmounts(trialId) });

export function useLevelAmounts(trialId: number, enabled: boolean) {
  return useQuery({ ...levelAmountsQueryOptions(trialId), enabled });
}
