import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';
import type { components } from '../../../lib/api-schema';

/** The body of POST /api/stats/anova (see docs/api.md). */
export type AnovaRequest = components['schemas']['AnovaRequestDto'];
/** The designs POST /api/stats/anova analyses (Quick analysis offers these). */
export type QuickDesign = AnovaRequest['design'];
/** One row given to the engine: a treatment (or a factorial's levels), its block and site, and the value. */
export type AnalysisObservation = AnovaRequest['observations'][number];

/** POST /api/stats/anova — the stateless analysis of pasted observations (nothing is stored). */
export function runAnova(request: AnovaRequest) {
  return unwrap(api.POST('/api/stats/anova', { body: request }));
}

/** Keyed by the whole request, so changing a choice asks again and going back reuses the answer. */
export const anovaQueryOptions = (request: AnovaRequest) =>
  queryOptions({ queryKey: ['stats', 'anova', request], queryFn: () => runAnova(request), staleTime: Infinity, retry: false });

export function useAnova(request: AnovaRequest | null) {
  return useQuery({ ...anovaQueryOptions(request ?? { design: 'crd', observations: [] }), enabled: request !== null });
}
