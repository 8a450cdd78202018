import { useMutation, useQueryClient } from '@tanstack/react-query';
import { teamSummarySchema, type TeamInput } from '../../../../shared/schemas/team';
import { apiFetch } from '../../../lib/api-client';
import { meQueryKey } from '../../../lib/session';

/** POST /api/teams: a new shared team with the user as owner. */
export async function createTeam(input: TeamInput) {
  return teamSummarySchema.parse(await apiFetch('/teams', { method: 'POST', body: JSON.stringify(input) }));
}

export function useCreateTeam() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createTeam,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: meQueryKey }),
  });
}
