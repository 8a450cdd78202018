import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  teamMaterialSchema,
  type TeamMaterial,
  type TeamMaterialPage,
  type TeamMaterialPatch,
} from '../../../../shared/schemas/material';
import { apiFetch } from '../../../lib/api-client';
import { materialKeys } from './materials';

/** The material as the table shows it while its change is on the way. */
function patched(material: TeamMaterial, patch: TeamMaterialPatch): TeamMaterial {
  const { clearanceAdjustments, ...rest } = patch;
  return {
    ...material,
    ...(rest as Partial<TeamMaterial>),
    clearanceAdjustments: { ...material.clearanceAdjustments, ...clearanceAdjustments },
  };
}

/**
 * PATCH /api/teams/:teamId/materials/:materialId (editors, owners): only the fields that changed. Optimistic:
 * the lists show the change at once and get their old rows back when the server refuses it.
 */
export function useUpdateMaterial(teamId: string) {
  const queryClient = useQueryClient();
  const lists = { queryKey: materialKeys.all(teamId) };
  return useMutation({
    mutationFn: async ({ id, patch }: { id: string; patch: TeamMaterialPatch }) =>
      teamMaterialSchema.parse(
        await apiFetch(`/teams/${teamId}/materials/${id}`, { method: 'PATCH', body: JSON.stringify(patch) }),
      ),
    onMutate: async ({ id, patch }) => {
      await queryClient.cancelQueries(lists);
      const previous = queryClient.getQueriesData<TeamMaterialPage>(lists);
      queryClient.setQueriesData<TeamMaterialPage>(
        lists,
        (page) => page && { ...page, items: page.items.map((m) => (m.id === id ? patched(m, patch) : m)) },
      );
      return { previous };
    },
    onError: (_e, _vars, context) => context?.previous.forEach(([key, data]) => queryClient.setQueryData(key, data)),
    onSettled: () => queryClient.invalidateQueries(lists),
  });
}
