import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';
import { meQueryKey } from '../../../lib/session';
import { teamKeys } from './keys';

/** DELETE /api/teams/:teamId/members/:userId: owners remove anyone; anyone may remove themselves (leave). */
export async function removeMember({ teamId, userId }: { teamId: string; userId: string }): Promise<void> {
  await apiFetch(`/teams/${teamId}/members/${userId}`, { method: 'DELETE' });
}

export function useRemoveMember(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: removeMember,
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: teamKeys.members(teamId) });
      void queryClient.invalidateQueries({ queryKey: teamKeys.audit(teamId) });
      void queryClient.invalidateQueries({ queryKey: meQueryKey });
    },
  });
}
