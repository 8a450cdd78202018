import { queryOptions, useQuery } from '@tanstack/react-query';
import { presetVersionListSchema } from '../../../../shared/schemas/preset-version';
import { apiFetch } from '../../../lib/api-client';
import { presetKeys } from './keys';

/** GET /api/teams/:teamId/presets/:presetId/versions, newest first. */
export async function getVersions(teamId: string, id: string) {
  return presetVersionListSchema.parse(await apiFetch(`/teams/${teamId}/presets/${id}/versions`));
}

export const versionsQueryOptions = (teamId: string, id: string) =>
  queryOptions({ queryKey: presetKeys.versions(teamId, id), queryFn: () => getVersions(teamId, id) });
export const useVersions = (teamId: string, id: string) => useQuery(versionsQueryOptions(teamId, id));
