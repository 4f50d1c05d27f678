import { useMutation, useQueryClient } from '@tanstack/react-query';
import { trialQueryOptions } from '../../../lib/api/get-trial';

/**
 * A change to a trial's protocol: after it succeeds the whole trial (and what hangs off it: plots,
 * amounts) is loaded again, so every page shows the server's own view.
 */
export function useProtocolMutation<TInput, TResult>(trialId: number, mutationFn: (input: TInput) => Promise<TResult>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn,
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: trialQueryOptions(trialId).queryKey });
    },
  });
}
