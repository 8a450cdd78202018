import { useMutation, useQueryClient } from '@tanstack/react-query';
import { presetSchema, type PresetInput } from '../../../../shared/schemas/preset';
import { apiFetch } from '../../../lib/api-client';
import { presetKeys } from './keys';

/** POST /api/teams/:teamId/presets (editors, owners). */
export async function createPreset(teamId: string, body: PresetInput) {
  return presetSchema.parse(await apiFetch(`/teams/${teamId}/presets`, { method: 'POST', body: JSON.stringify(body) }));
}

export function useCreatePreset(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: PresetInput) => createPreset(teamId, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: presetKeys.all(teamId) }),
  });
}
