import { queryOptions, useQuery } from '@tanstack/react-query';
import { fitTestListSchema } from '../../../../shared/schemas/fit-test';
import { apiFetch } from '../../../lib/api-client';

/** Query keys of a printer's fit tests. */
export const fitTestKeys = {
  list: (teamId: string, profileId: string) => ['teams', teamId, 'printer-profiles', profileId, 'fit-tests'] as const,
};

export const fitTestsPath = (teamId: string, profileId: string) =>
  `/teams/${teamId}/printer-profiles/${profileId}/fit-tests`;

/** GET …/printer-profiles/:profileId/fit-tests: newest first. */
export async function getFitTests(teamId: string, profileId: string) {
  return fitTestListSchema.parse(await apiFetch(fitTestsPath(teamId, profileId)));
}

export const fitTestsQueryOptions = (teamId: string, profileId: string) =>
  queryOptions({
    queryKey: fitTestKeys.list(teamId, profileId),
    queryFn: () => getFitTests(teamId, profileId),
  });
export const useFitTests = (teamId: string, profileId: string) => useQuery(fitTestsQueryOptions(teamId, profileId));
