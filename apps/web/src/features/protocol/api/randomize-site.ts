import { api, unwrap } from '../../../lib/api-client';
import { useProtocolMutation } from './use-protocol-mutation';

export interface RandomizeSite {
  siteId: number;
  /** Leave out to use the trial's seed. */
  seed?: string;
}

/** POST /api/trials/:trialId/sites/:siteId/randomize — lays out (or lays out again) the site's plots; answers with the site. */
export function randomizeSite(trialId: number, { siteId, seed }: RandomizeSite) {
  return unwrap(api.POST('/api/trials/{trialId}/sites/{siteId}/randomize', { params: { path: { trialId, siteId } }, body: seed ? { seed } : {} }));
}

/** The trial key is the prefix of the plots and amounts keys, so all three load again. */
export function useRandomizeSite(trialId: number) {
  return useProtocolMutation(trialId, (input: RandomizeSite) => randomizeSite(trialId, input));
}
