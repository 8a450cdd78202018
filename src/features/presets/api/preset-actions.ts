import { useMutation, useQueryClient } from '@tanstack/react-query';
import { presetSchema, type PresetPage } from '../../../../shared/schemas/preset';
import { apiFetch } from '../../../lib/api-client';
import { presetKeys } from './keys';

type Action = 'archive' | 'unarchive' | 'duplicate' | 'delete';

/** POST …/presets/:id/archive, …/unarchive, …/duplicate (editors, owners) or DELETE …/presets/:id (owners). */
export async function presetAction(teamId: string, id: string, action: Action) {
  const path = `/teams/${teamId}/presets/${id}`;
  if (action === 'delete') {
    await apiFetch(path, { method: 'DELETE' });
    return null;
  }
  return presetSchema.parse(await apiFetch(`${path}/${action}`, { method: 'POST', body: '{}' }));
}

/**
 * Archive, unarchive, duplicate or delete from the list. Archive, unarchive and delete show at once in every
 * cached page and roll back if the server refuses.
 */
export function usePresetAction(teamId: string) {
  const queryClient = useQueryClient();
  const lists = { queryKey: [...presetKeys.all(teamId), 'list'] };
  return useMutation({
    mutationFn: ({ id, action }: { id: string; action: Action }) => presetAction(teamId, id, action),
    onMutate: async ({ id, action }) => {
      await queryClient.cancelQueries(lists);
      const previous = queryClient.getQueriesData<PresetPage>(lists);
      if (action !== 'duplicate') {
        queryClient.setQueriesData<PresetPage>(lists, (page) => {
          if (!page) return page;
          if (action === 'delete')
            return { ...page, items: page.items.filter((p) => p.id !== id), total: page.total - 1 };
          return {
            ...page,
            items: page.items.map((p) => (p.id === id ? { ...p, archived: action === 'archive' } : p)),
          };
        });
      }
      return { previous };
    },
    onError: (_error, _vars, context) => {
      for (const [key, data] of context?.previous ?? []) queryClient.setQueryData(key, data);
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: presetKeys.all(teamId) }),
  });
}
