import { useMutation, useQueryClient } from '@tanstack/react-query';
import { presetSchema, type Preset, type PresetPatch } from '../../../../shared/schemas/preset';
import { ApiError, apiFetch } from '../../../lib/api-client';
import { presetKeys } from './keys';

/** PATCH /api/teams/:teamId/presets/:presetId {baseVersion, …} (editors, owners). */
export async function updatePreset(teamId: string, id: string, patch: PresetPatch) {
  return presetSchema.parse(
    await apiFetch(`/teams/${teamId}/presets/${id}`, { method: 'PATCH', body: JSON.stringify(patch) }),
  );
}

/** The current preset a 409 carries when a save was based on an older version, else null. */
export function conflictOf(error: unknown): Preset | null {
  if (!(error instanceof ApiError) || error.status !== 409) return null;
  const current = presetSchema.safeParse(error.details.current);
  return current.success ? current.data : null;
}

/**
 * Saves an edit. The detail cache shows the edit at once and rolls back if the save fails; a 409 puts the
 * server's current version in the cache, so the page shows what the other person saved.
 */
export function useUpdatePreset(teamId: string, id: string) {
  const queryClient = useQueryClient();
  const key = presetKeys.detail(teamId, id);
  return useMutation({
    mutationFn: (patch: PresetPatch) => updatePreset(teamId, id, patch),
    onMutate: async (patch) => {
      await queryClient.cancelQueries({ queryKey: key });
      const previous = queryClient.getQueryData<Preset>(key);
      if (previous) {
        const { baseVersion: _b, settings: _s, ...fields } = patch;
        queryClient.setQueryData<Preset>(key, { ...previous, ...fields });
      }
      return { previous };
    },
    onError: (error, _patch, context) => {
      queryClient.setQueryData(key, conflictOf(error) ?? context?.previous);
    },
    onSuccess: (saved) => queryClient.setQueryData(key, saved),
    onSettled: () => queryClient.invalidateQueries({ queryKey: presetKeys.all(teamId) }),
  });
}
