import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';
import { meQueryKey } from '../../../lib/session';

/** POST /api/auth/sign-out-everywhere: ends every session of the account, this one included. */
export async function signOutEverywhere(): Promise<void> {
  await apiFetch('/auth/sign-out-everywhere', { method: 'POST' });
}

export function useSignOutEverywhere() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOutEverywhere,
    onSuccess: () => {
      queryClient.clear();
      queryClient.setQueryData(meQueryKey, null);
    },
  });
}
