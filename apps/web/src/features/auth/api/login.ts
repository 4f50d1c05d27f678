import type { LoginRequest, LoginResponse } from '@friable/contracts';
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

export function login(request: LoginRequest): Promise<LoginResponse> {
  return apiRequest<LoginResponse>('/auth/login', { method: 'POST', json: request });
}

export function useLogin() {
  return useMutation({ mutationFn: login });
}
