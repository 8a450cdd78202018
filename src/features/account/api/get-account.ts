import { queryOptions, useQuery } from '@tanstack/react-query';
import { accountSchema } from '../../../../shared/schemas/account';
import { apiFetch } from '../../../lib/api-client';

/** GET /api/account: the account's own details, including whether the address is confirmed. */
export async function getAccount() {
  return accountSchema.parse(await apiFetch('/account'));
}

export const accountQueryOptions = () => queryOptions({ queryKey: ['account'], queryFn: getAccount });
export const useAccount = () => useQuery(accountQueryOptions());
