import { useMutation, useQueryClient } from '@tanstack/react-query';
import { memberSchema, type Role } from '../../../../shared/schemas/team';
import { apiFetch } from '../../../lib/api-client';
import { meQueryKey } from '../../../lib/session';
import { teamKeys } from './keys';

/** PATCH /api/teams/:teamId/members/:userId {role} (owners). */
export async function changeRole({ teamId, userId, role }: { teamId: string; userId: string; role: Role }) {
  const body = JSON.stringify({ role });
  return memberSchema.parse(await apiFetch(`/teams/${teamId}/members/${userId}`, { method: 'PATCH', body }));
}

export function useChangeRole(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: changeRole,
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: teamKeys.members(teamId) });
      void queryClient.invalidateQueries({ queryKey: teamKeys.audit(teamId) });
      void queryClient.invalidateQueries({ queryKey: meQueryKey });
    },
  });
}
