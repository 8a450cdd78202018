import { useMutation } from '@tanstack/react-query';
import type { ChangePasswordInput } from '../../../../shared/schemas/account';
import { apiFetch } from '../../../lib/api-client';

/** POST /api/account/password: other devices are signed out, this one stays. */
export async function changePassword(input: ChangePasswordInput): Promise<void> {
  await apiFetch('/account/password', { method: 'POST', body: JSON.stringify(input) });
}

export const useChangePassword = () => useMutation({ mutationFn: changePassword });
