import { useMutation } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';

/** POST /api/auth/password-reset/request: the reply is the same whether or not the address exists. */
export async function requestPasswordReset(input: { email: string }): Promise<{ message: string }> {
  return apiFetch('/auth/password-reset/request', { method: 'POST', body: JSON.stringify(input) });
}

/** POST /api/auth/password-reset/confirm: sets the new password; every session ends. */
export async function confirmPasswordReset(input: { token: string; password: string }): Promise<void> {
  await apiFetch('/auth/password-reset/confirm', { method: 'POST', body: JSON.stringify(input) });
}

export const useRequestPasswordReset = () => useMutation({ mutationFn: requestPasswordReset });
export const useConfirmPasswordReset = () => useMutation({ mutationFn: confirmPasswordReset });
