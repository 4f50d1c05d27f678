import type { SeparationMethod } from '@friable/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';

/** The Findings page's choices the printed report follows; each left out takes the report's default. */
export interface ReportChoices {
  roundId?: number;
  siteId?: number;
  sitesAre?: 'random' | 'fixed';
  method?: SeparationMethod;
  alpha?: number;
}

/** GET /api/trials/:trialId/report — the protocol, sites and per measure the ANOVA and means of the chosen (else latest) round, scope and method. */
export function getReport(trialId: number, choices: ReportChoices = {}) {
  return unwrap(api.GET('/api/trials/{trialId}/report', { params: { path: { trialId }, query: choices } }));
}

export const reportQueryOptions = (trialId: number, choices: ReportChoices = {}) =>
  queryOptions({ queryKey: ['trials', trialId, 'report', choices], queryFn: () => getReport(trialId, choices) });

export function useReport(trialId: number, choices: ReportChoices = {}) {
  return useQuery(reportQueryOptions(trialId, choices));
}
