import type { DoseAnswer, DoseRequest } from '@friable/contracts';
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** POST /api/rates/dose — the server's Rate calculator (the same arithmetic as @friable/field). */
export function computeDoseOnServer(request: DoseRequest): Promise<DoseAnswer> {
  return apiRequest<DoseAnswer>('/rates/dose', { method: 'POST', json: request });
}

export function useComputeDose() {
  return useMutation({ mutationFn: computeDoseOnServer });
}
