import { useMutation, useQueryClient } from '@tanstack/react-query';
import { meSchema } from '../../../../shared/schemas/account';
import type { signUpSchema } from '../../../../shared/schemas/auth';
import type { z } from 'zod';
import { apiFetch } from '../../../lib/api-client';
import { meQueryKey } from '../../../lib/session';

/** POST /api/auth/sign-up: creates the account and signs it in. */
export async function signUp(input: z.output<typeof signUpSchema>) {
  return meSchema.parse(await apiFetch('/auth/sign-up', { method: 'POST', body: JSON.stringify(input) }));
}

export function useSignUp() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: signUp, onSuccess: (me) => queryClient.setQueryData(meQueryKey, me) });
}
