import type { Site } from '@friable/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { trialQueryOptions } from './get-trial';

export interface RandomizeSite {
  siteId: number;
  /** Leave out to use the trial's seed. */
  seed?: string;
}

/** POST /api/trials/:trialId/sites/:siteId/randomize — lays out (or lays out again) the site's plots; answers with the site. */
export function randomizeSite(trialId: number, { siteId, seed }: RandomizeSite): Promise<Site> {
  return apiRequest<Site>(`/trials/${trialId}/sites/${siteId}/randomize`, { method: 'POST', json: seed ? { seed } : {} });
}

export function useRandomizeSite(trialId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: RandomizeSite) => randomizeSite(trialId, input),
    // The trial key is the prefix of the plots and amounts keys, so all three load again.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: trialQueryOptions(trialId).queryKey }),
  });
}
