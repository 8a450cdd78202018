import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';
import { teamKeys } from './keys';

/** DELETE /api/teams/:teamId/invitations/:invitationId (owners): the link stops working. */
export async function revokeInvitation(teamId: string, invitationId: string): Promise<void> {
  await apiFetch(`/teams/${teamId}/invitations/${invitationId}`, { method: 'DELETE' });
}

export function useRevokeInvitation(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: string) => revokeInvitation(teamId, invitationId),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: teamKeys.invitations(teamId) });
      void queryClient.invalidateQueries({ queryKey: teamKeys.audit(teamId) });
    },
  });
}
