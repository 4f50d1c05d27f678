import type { TrialCreateInput } from '@friable/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';
import { trialsQueryOptions } from './get-trials';

/** POST /api/trials — a new draft trial; the caller becomes its investigator. */
export function createTrial(input: TrialCreateInput) {
  return unwrap(api.POST('/api/trials', { body: input }));
}

export function useCreateTrial() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createTrial,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: trialsQueryOptions().queryKey, exact: true }),
  });
}
