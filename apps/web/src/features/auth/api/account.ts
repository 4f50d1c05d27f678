import type { MySettingsInput, PasswordChangeInput, PasswordResetConfirmInput, PasswordResetRequestInput } from '@friable/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';
import { meQueryOptions } from './get-me';

/** PATCH /api/users/me — one's own display name, locale and e-mail preferences. */
export function updateMySettings(body: MySettingsInput) {
  return unwrap(api.PATCH('/api/users/me', { body }));
}

/** POST /api/auth/password — change one's own password (the current one is required; other sessions end). */
export function changePassword(body: PasswordChangeInput) {
  return unwrap(api.POST('/api/auth/password', { body }));
}

/** POST /api/auth/password-reset — e-mails a reset link; the same answer for any address. */
export function requestPasswordReset(body: PasswordResetRequestInput) {
  return unwrap(api.POST('/api/auth/password-reset', { body }));
}

/** POST /api/auth/password-reset/confirm — sets the new password from the e-mailed link (every session ends). */
export function confirmPasswordReset(body: PasswordResetConfirmInput) {
  return unwrap(api.POST('/api/auth/password-reset/confirm', { body }));
}

export function useUpdateMySettings() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateMySettings, onSuccess: (me) => queryClient.setQueryData(meQueryOptions().queryKey, me) });
}

export const useChangePassword = () => useMutation({ mutationFn: changePassword });
export const useRequestPasswordReset = () => useMutation({ mutationFn: requestPasswordReset });
export const useConfirmPasswordReset = () => useMutation({ mutationFn: confirmPasswordReset });
