import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { accountSchema, type Account, type Units } from '../../shared/schemas/account';
import { apiFetch } from './api-client';

// GET /api/account lives here rather than in the account feature: the design screen reads the account's
// units too, and features do not import each other. Both share this one cache entry.

/** GET /api/account: the account's own details, its units included. */
export async function getAccount(): Promise<Account> {
  return accountSchema.parse(await apiFetch('/account'));
}

export const accountQueryKey = ['account'] as const;
export const accountQueryOptions = () => queryOptions({ queryKey: accountQueryKey, queryFn: getAccount });

/** PATCH /api/account: saves the units lengths are shown and typed in; answers with the whole account. */
export async function saveUnits(units: Units): Promise<Account> {
  return accountSchema.parse(await apiFetch('/account', { method: 'PATCH', body: JSON.stringify({ units }) }));
}

const saveUnitsKey = ['account', 'units'] as const;

/**
 * Saves the account's units with an optimistic update: the cache shows the choice at once and goes back
 * to what it was if the server refuses. Only the last of several quick changes refreshes from the server,
 * so an earlier reply cannot overwrite a later choice.
 */
export function useSaveUnits() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey: saveUnitsKey,
    mutationFn: saveUnits,
    onMutate: async (units: Units) => {
      await queryClient.cancelQueries({ queryKey: accountQueryKey, exact: true });
      const previous = queryClient.getQueryData<Account>(accountQueryKey);
      if (previous) queryClient.setQueryData<Account>(accountQueryKey, { ...previous, units });
      return { previous };
    },
    onError: (_error, _units, context) => {
      if (context?.previous) queryClient.setQueryData(accountQueryKey, context.previous);
    },
    onSettled: () => {
      if (queryClient.isMutating({ mutationKey: saveUnitsKey }) === 1)
        return queryClient.invalidateQueries({ queryKey: accountQueryKey, exact: true });
    },
  });
}

/**
 * The signed-in account's units (undefined while loading or when nobody is signed in), a saver and the
 * last save's failure.
 * Pass `enabled: false` when nobody is signed in: GET /api/account would only answer 401.
 */
export function useUnitsPreference(enabled = true): {
  units: Units | undefined;
  save: (units: Units) => void;
  /** Why the last save failed (the choice went back), or null. */
  saveError: string | null;
} {
  const { data } = useQuery({ ...accountQueryOptions(), enabled });
  const { mutate, error } = useSaveUnits();
  return { units: enabled ? data?.units : undefined, save: mutate, saveError: error?.message ?? null };
}
