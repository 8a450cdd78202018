import { useMutation, useQueryClient } from '@tanstack/react-query';
import { fitTestSchema } from '../../../../shared/schemas/fit-test';
import { apiFetch } from '../../../lib/api-client';
import { fitTestKeys, fitTestsPath } from './fit-tests';
import { printerKeys } from './printer-profiles';

/** POST …/fit-tests/:testId/make-current (editors, owners): the profile's calibration comes from that test again. */
export async function makeFitTestCurrent(teamId: string, profileId: string, testId: string) {
  return fitTestSchema.parse(
    await apiFetch(`${fitTestsPath(teamId, profileId)}/${testId}/make-current`, { method: 'POST' }),
  );
}

export function useMakeFitTestCurrent(teamId: string, profileId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (testId: string) => makeFitTestCurrent(teamId, profileId, testId),
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: fitTestKeys.list(teamId, profileId) }),
        queryClient.invalidateQueries({ queryKey: printerKeys.all(teamId) }),
      ]),
  });
}
