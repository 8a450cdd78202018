import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';
import { meQueryKey } from '../../../lib/session';

/** POST /api/auth/sign-out (this device) or /api/auth/sign-out-everywhere (every device). */
export async function signOut(everywhere = false): Promise<void> {
  await apiFetch(everywhere ? '/auth/sign-out-everywhere' : '/auth/sign-out', { method: 'POST' });
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSuccess: () => {
      queryClient.clear();
      queryClient.setQueryData(meQueryKey, null);
    },
  });
}
