import { useMutation, useQueryClient } from '@tanstack/react-query';
import { trialQueryOptions } from '../../../lib/api/get-trial';
import { conflictCurrent } from '../../../lib/edit-conflict';

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
    // Someone else saved first: the pages show the stored records while the person chooses.
    onError: async (error) => {
      if (conflictCurrent(error) !== undefined) await queryClient.invalidateQueries({ queryKey: trialQueryOptions(trialId).queryKey });
    },
  });
}
