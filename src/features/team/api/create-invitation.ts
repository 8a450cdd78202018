import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { invitationSchema, type createInvitationSchema } from '../../../../shared/schemas/invitation';
import { apiFetch } from '../../../lib/api-client';
import { teamKeys } from './keys';

/** POST /api/teams/:teamId/invitations (owners with a confirmed address); mails the link. */
export async function createInvitation(teamId: string, input: z.output<typeof createInvitationSchema>) {
  const body = JSON.stringify(input);
  return invitationSchema.parse(await apiFetch(`/teams/${teamId}/invitations`, { method: 'POST', body }));
}

export function useCreateInvitation(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: z.output<typeof createInvitationSchema>) => createInvitation(teamId, input),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: teamKeys.invitations(teamId) });
      void queryClient.invalidateQueries({ queryKey: teamKeys.audit(teamId) });
    },
  });
}
