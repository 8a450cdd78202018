import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';

/** POST /api/auth/verify-email with the token from the mailed link. */
export async function verifyEmail(token: string): Promise<void> {
  await apiFetch('/auth/verify-email', { method: 'POST', body: JSON.stringify({ token }) });
}

/** POST /api/auth/resend-verification: mails a fresh link. */
export async function resendVerification(): Promise<void> {
  await apiFetch('/auth/resend-verification', { method: 'POST' });
}

export function useVerifyEmail() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: verifyEmail,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['account'] }),
  });
}
export const useResendVerification = () => useMutation({ mutationFn: resendVerification });
