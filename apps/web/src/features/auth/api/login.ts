import type { LoginRequest } from '@friable/contracts';
import { useMutation } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';

/** POST /api/auth/login — a session and the person it belongs to (401 for a wrong e-mail or password). */
export function login(request: LoginRequest) {
  return unwrap(api.POST('/api/auth/login', { body: request }));
}

export function useLogin() {
  return useMutation({ mutationFn: login });
}
