import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { teamDetailSchema, type TeamInput } from '../../../../shared/schemas/team';
import { apiFetch } from '../../../lib/api-client';
import { meQueryKey } from '../../../lib/session';
import { teamKeys } from './keys';

/** GET /api/teams/:teamId: the team with whether it is someone's personal team. */
export const useTeamDetail = (teamId: string) =>
  useQuery({
    queryKey: teamKeys.detail(teamId),
    queryFn: async () => teamDetailSchema.parse(await apiFetch(`/teams/${teamId}`)),
    enabled: teamId !== '',
  });

/** PATCH /api/teams/:teamId {name} (owners): the header and switcher show the new name at once. */
export function useRenameTeam(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: TeamInput) =>
      teamDetailSchema.parse(await apiFetch(`/teams/${teamId}`, { method: 'PATCH', body: JSON.stringify(input) })),
    onSuccess: (team) => {
      queryClient.setQueryData(teamKeys.detail(teamId), team);
      return queryClient.invalidateQueries({ queryKey: meQueryKey });
    },
  });
}

/**
 * DELETE /api/teams/:teamId (owners; never a personal team): the team and its whole library go. On success
 * the user moves on first (`moveTo`) (this page unmounts when the team list changes, so nothing after that
 * may depend on it), the deleted team's cached queries are dropped, and the team list is fetched again.
 */
export function useDeleteTeam(teamId: string, moveTo: () => void) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch(`/teams/${teamId}`, { method: 'DELETE' }),
    onSuccess: () => {
      moveTo();
      queryClient.removeQueries({ queryKey: ['teams', teamId] });
      return queryClient.invalidateQueries({ queryKey: meQueryKey });
    },
  });
}
