import { keepPreviousData, queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import {
  kitCheckSchema,
  kitHistoryPageSchema,
  type KitHistoryQuery,
  type RecordKitInput,
} from '../../../../shared/schemas/kit-history';
import { apiFetch, apiFile, saveFile, toQueryString } from '../../../lib/api-client';

/** Query keys of the kit history feature. */
export const kitKeys = {
  all: (teamId: string) => ['teams', teamId, 'kits'] as const,
  list: (teamId: string, query: KitHistoryQuery) => ['teams', teamId, 'kits', query] as const,
};

/** GET /api/teams/:teamId/kits: the kits the team downloaded. */
export const kitHistoryQueryOptions = (teamId: string, query: KitHistoryQuery) =>
  queryOptions({
    queryKey: kitKeys.list(teamId, query),
    queryFn: async () => kitHistoryPageSchema.parse(await apiFetch(`/teams/${teamId}/kits?${toQueryString(query)}`)),
    placeholderData: keepPreviousData,
  });
export const useKitHistory = (teamId: string, query: KitHistoryQuery) =>
  useQuery(kitHistoryQueryOptions(teamId, query));

/** GET …/kits/:kitId/check: rebuilds the kit and compares each STL with its recorded SHA-256. */
export function useCheckKit(teamId: string) {
  return useMutation({
    mutationFn: async (kitId: string) => kitCheckSchema.parse(await apiFetch(`/teams/${teamId}/kits/${kitId}/check`)),
  });
}

/** GET …/kits/:kitId/download?variant=current|original, saved by the browser. */
export async function downloadKit(teamId: string, kitId: string, variant: 'current' | 'original') {
  saveFile(await apiFile(`/teams/${teamId}/kits/${kitId}/download?variant=${variant}`));
}

/**
 * POST /api/teams/:teamId/kits: builds a kit, records it in the history and downloads it. For the design
 * screen: send this instead of the public POST /api/kits when someone is signed in.
 */
export async function recordAndDownloadKit(teamId: string, body: RecordKitInput) {
  const file = await apiFile(`/teams/${teamId}/kits`, { method: 'POST', body: JSON.stringify(body) });
  saveFile(file);
  return file.headers.get('X-Seamwright-Kit-Id');
}
