import { useMutation, useQueryClient } from '@tanstack/react-query';
import { presetSchema } from '../../../../shared/schemas/preset';
import { apiFetch } from '../../../lib/api-client';
import { presetKeys } from './keys';

/** POST …/presets/:presetId/versions/:version/restore {baseVersion} (editors, owners). */
export async function restoreVersion(teamId: string, id: string, version: number, baseVersion: number) {
  const body = JSON.stringify({ baseVersion });
  return presetSchema.parse(
    await apiFetch(`/teams/${teamId}/presets/${id}/versions/${version}/restore`, { method: 'POST', body }),
  );
}

export function useRestoreVersion(teamId: string, id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ version, baseVersion }: { version: number; baseVersion: number }) =>
      restoreVersion(teamId, id, version, baseVersion),
    onSuccess: (saved) => queryClient.setQueryData(presetKeys.detail(teamId, id), saved),
    onSettled: () => queryClient.invalidateQueries({ queryKey: presetKeys.all(teamId) }),
  });
}
