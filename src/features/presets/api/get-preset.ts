import { queryOptions, useQuery } from '@tanstack/react-query';
import { presetSchema } from '../../../../shared/schemas/preset';
import { apiFetch } from '../../../lib/api-client';
import { presetKeys } from './keys';

/** GET /api/teams/:teamId/presets/:presetId. */
export async function getPreset(teamId: string, id: string) {
  return presetSchema.parse(await apiFetch(`/teams/${teamId}/presets/${id}`));
}

export const presetQueryOptions = (teamId: string, id: string) =>
  queryOptions({ queryKey: presetKeys.detail(teamId, id), queryFn: () => getPreset(teamId, id) });
export const usePreset = (teamId: string, id: string) => useQuery(presetQueryOptions(teamId, id));
