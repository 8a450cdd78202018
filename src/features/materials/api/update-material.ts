import { useMutation, useQueryClient } from '@tanstack/react-query';
import { teamMaterialSchema, type TeamMaterialPatch } from '../../../../shared/schemas/material';
import { apiFetch } from '../../../lib/api-client';
import { materialKeys } from './materials';

/** PATCH /api/teams/:teamId/materials/:materialId (editors, owners): only the fields that changed. */
export function useUpdateMaterial(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, patch }: { id: string; patch: TeamMaterialPatch }) =>
      teamMaterialSchema.parse(
        await apiFetch(`/teams/${teamId}/materials/${id}`, { method: 'PATCH', body: JSON.stringify(patch) }),
      ),
    onSettled: () => queryClient.invalidateQueries({ queryKey: materialKeys.all(teamId) }),
  });
}
