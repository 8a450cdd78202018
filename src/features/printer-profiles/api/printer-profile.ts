import { queryOptions, useQuery } from '@tanstack/react-query';
import { printerProfileSchema } from '../../../../shared/schemas/printer-profile';
import { apiFetch } from '../../../lib/api-client';
import { printerKeys } from './printer-profiles';

/** GET /api/teams/:teamId/printer-profiles/:profileId. */
export async function getPrinterProfile(teamId: string, profileId: string) {
  return printerProfileSchema.parse(await apiFetch(`/teams/${teamId}/printer-profiles/${profileId}`));
}

// Under printerKeys.all, so every save of a profile or of a fit test refreshes it too.
export const printerProfileQueryOptions = (teamId: string, profileId: string) =>
  queryOptions({
    queryKey: [...printerKeys.all(teamId), 'one', profileId] as const,
    queryFn: () => getPrinterProfile(teamId, profileId),
  });
export const usePrinterProfile = (teamId: string, profileId: string) =>
  useQuery(printerProfileQueryOptions(teamId, profileId));
