import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  materialCatalogueSchema,
  teamMaterialPageSchema,
  teamMaterialSchema,
  type TeamMaterialInput,
  type TeamMaterialListQuery,
  type TeamMaterialPage,
} from '../../../../shared/schemas/material';
import { apiFetch, toQueryString } from '../../../lib/api-client';

/** Query keys of the materials feature. */
export const materialKeys = {
  catalogue: (teamId: string) => ['teams', teamId, 'materials', 'catalogue'] as const,
  all: (teamId: string) => ['teams', teamId, 'materials', 'team'] as const,
  list: (teamId: string, query: TeamMaterialListQuery) => ['teams', teamId, 'materials', 'team', query] as const,
};

/** GET /api/teams/:teamId/materials/catalogue: the built-in materials with their sources. */
export const catalogueQueryOptions = (teamId: string) =>
  queryOptions({
    queryKey: materialKeys.catalogue(teamId),
    queryFn: async () => materialCatalogueSchema.parse(await apiFetch(`/teams/${teamId}/materials/catalogue`)),
    staleTime: Infinity,
  });
export const useCatalogue = (teamId: string) => useQuery(catalogueQueryOptions(teamId));

/** GET /api/teams/:teamId/materials: the team's own materials. */
export const teamMaterialsQueryOptions = (teamId: string, query: TeamMaterialListQuery) =>
  queryOptions({
    queryKey: materialKeys.list(teamId, query),
    queryFn: async () =>
      teamMaterialPageSchema.parse(await apiFetch(`/teams/${teamId}/materials?${toQueryString(query)}`)),
    placeholderData: keepPreviousData,
  });
export const useTeamMaterials = (teamId: string, query: TeamMaterialListQuery) =>
  useQuery(teamMaterialsQueryOptions(teamId, query));

/** POST /api/teams/:teamId/materials (editors, owners). */
export function useCreateMaterial(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body: TeamMaterialInput) =>
      teamMaterialSchema.parse(
        await apiFetch(`/teams/${teamId}/materials`, { method: 'POST', body: JSON.stringify(body) }),
      ),
    onSettled: () => queryClient.invalidateQueries({ queryKey: materialKeys.all(teamId) }),
  });
}

/** DELETE /api/teams/:teamId/materials/:id (owners); optimistic, rolled back on failure. */
export function useDeleteMaterial(teamId: string) {
  const queryClient = useQueryClient();
  const lists = { queryKey: materialKeys.all(teamId) };
  return useMutation({
    mutationFn: (id: string) => apiFetch<void>(`/teams/${teamId}/materials/${id}`, { method: 'DELETE' }),
    onMutate: async (id) => {
      await queryClient.cancelQueries(lists);
      const previous = queryClient.getQueriesData<TeamMaterialPage>(lists);
      queryClient.setQueriesData<TeamMaterialPage>(
        lists,
        (page) => page && { ...page, items: page.items.filter((m) => m.id !== id), total: page.total - 1 },
      );
      return { previous };
    },
    onError: (_e, _id, context) => context?.previous.forEach(([key, data]) => queryClient.setQueryData(key, data)),
    onSettled: () => queryClient.invalidateQueries(lists),
  });
}
