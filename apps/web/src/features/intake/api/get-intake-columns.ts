import type { IntakeColumnChoice } from '@friable/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';

/** GET /api/trials/:trialId/intake-columns — what the trial's uploads read their own headers as, where someone chose it. */
export function getIntakeColumns(trialId: number): Promise<IntakeColumnChoice[]> {
  return unwrap(api.GET('/api/trials/{trialId}/intake-columns', { params: { path: { trialId } } })) as Promise<IntakeColumnChoice[]>;
}

export const intakeColumnsQueryOptions = (trialId: number) => queryOptions({ queryKey: ['trials', trialId, 'intake-columns'], queryFn: () => getIntakeColumns(trialId) });

/** The remembered choices as header → choice, for the next upload's mapping step. */
export function useRememberedColumns(trialId: number): Record<string, string | null> {
  const { data } = useQuery(intakeColumnsQueryOptions(trialId));
  return Object.fromEntries((data ?? []).map((entry) => [entry.header, entry.choice]));
}
