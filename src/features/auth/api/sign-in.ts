import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { meSchema } from '../../../../shared/schemas/account';
import type { signInSchema } from '../../../../shared/schemas/auth';
import { apiFetch } from '../../../lib/api-client';
import { meQueryKey } from '../../../lib/session';

/** POST /api/auth/sign-in. */
export async function signIn(input: z.output<typeof signInSchema>) {
  return meSchema.parse(await apiFetch('/auth/sign-in', { method: 'POST', body: JSON.stringify(input) }));
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    // Everything cached belonged to whoever was signed in before.
    onSuccess: (me) => {
      queryClient.clear();
      queryClient.setQueryData(meQueryKey, me);
    },
  });
}
