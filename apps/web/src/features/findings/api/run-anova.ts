import type { AnalysisDesign, AnalysisTransform, AnovaAnswer, SeparationMethod } from '@friable/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** One row given to the engine: a treatment (or a factorial's levels), its block and site, and the value. */
export interface AnalysisObservation {
  treatment?: string;
  factors?: Record<string, string>;
  block?: string;
  site?: string;
  /** Decimal text is analysed exactly. */
  value: number | string;
}

/** The body of POST /api/stats/anova (see docs/api.md). */
export interface AnovaRequest {
  design: AnalysisDesign;
  alpha?: number;
  sitesAre?: 'random' | 'fixed';
  control?: string;
  transform?: AnalysisTransform;
  meanSeparation?: SeparationMethod[];
  forceLsd?: boolean;
  observations: AnalysisObservation[];
}

/** POST /api/stats/anova — the stateless analysis of pasted observations (nothing is stored). */
export function runAnova(request: AnovaRequest): Promise<AnovaAnswer> {
  return apiRequest<AnovaAnswer>('/stats/anova', { method: 'POST', json: request });
}

/** Keyed by the whole request, so changing a choice asks again and going back reuses the answer. */
export const anovaQueryOptions = (request: AnovaRequest) =>
  queryOptions({ queryKey: ['stats', 'anova', request], queryFn: () => runAnova(request), staleTime: Infinity, retry: false });

export function useAnova(request: AnovaRequest | null) {
  return useQuery({ ...anovaQueryOptions(request ?? { design: 'crd', observations: [] }), enabled: request !== null });
}
