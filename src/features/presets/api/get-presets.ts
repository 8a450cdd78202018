import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { presetPageSchema, type PresetListQuery } from '../../../../shared/schemas/preset';
import { apiFetch, toQueryString } from '../../../lib/api-client';
import { presetKeys } from './keys';

/** GET /api/teams/:teamId/presets with search, filters, sort and paging. */
export async function getPresets(teamId: string, query: PresetListQuery) {
  return presetPageSchema.parse(await apiFetch(`/teams/${teamId}/presets?${toQueryString(query)}`));
}

export const presetsQueryOptions = (teamId: string, query: PresetListQuery) =>
  queryOptions({
    queryKey: presetKeys.list(teamId, query),
    queryFn: () => getPresets(teamId, query),
    placeholderData: keepPreviousData,
  });
export const usePresets = (teamId: string, query: PresetListQuery) => useQuery(presetsQueryOptions(teamId, query));
