import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../api-client';

/** GET /api/trials/:trialId/analyses — the saved analyses, newest first (without their results). */
export function getAnalyses(trialId: number) {
  return unwrap(api.GET('/api/trials/{trialId}/analyses', { params: { path: { trialId } } }));
}

/** The prefix of every saved analysis' key, so a change to one reloads the list too. */
export const analysesQueryOptions = (trialId: number) => queryOptions({ queryKey: ['trials', trialId, 'analyses'], queryFn: () => getAnalyses(trialId) });

export function useAnalyses(trialId: number | undefined) {
  return useQuery({ ...analysesQueryOptions(trialId ?? 0), enabled: trialId !== undefined });
}
