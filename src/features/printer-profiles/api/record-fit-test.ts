import { useMutation, useQueryClient } from '@tanstack/react-query';
import { fitTestSchema, type FitTestInput } from '../../../../shared/schemas/fit-test';
import { apiFetch } from '../../../lib/api-client';
import { fitTestKeys, fitTestsPath } from './fit-tests';
import { printerKeys } from './printer-profiles';

/** POST …/fit-tests (editors, owners): records the answers and makes the result the profile's calibration. */
export async function recordFitTest(teamId: string, profileId: string, body: FitTestInput) {
  return fitTestSchema.parse(
    await apiFetch(fitTestsPath(teamId, profileId), { method: 'POST', body: JSON.stringify(body) }),
  );
}

export function useRecordFitTest(teamId: string, profileId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: FitTestInput) => recordFitTest(teamId, profileId, body),
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: fitTestKeys.list(teamId, profileId) }),
        queryClient.invalidateQueries({ queryKey: printerKeys.all(teamId) }),
      ]),
  });
}
