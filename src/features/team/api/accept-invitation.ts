import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { invitationPreviewSchema } from '../../../../shared/schemas/invitation';
import { teamSummarySchema } from '../../../../shared/schemas/team';
import { apiFetch } from '../../../lib/api-client';
import { meQueryKey } from '../../../lib/session';

/** POST /api/invitations/preview: what the link offers (anyone holding it). */
export async function previewInvitation(token: string) {
  const body = JSON.stringify({ token });
  return invitationPreviewSchema.parse(await apiFetch('/invitations/preview', { method: 'POST', body }));
}

/** POST /api/invitations/accept: joins the team (signed in, confirmed, with the invited address). */
export async function acceptInvitation(token: string) {
  const body = JSON.stringify({ token });
  return teamSummarySchema.parse(await apiFetch('/invitations/accept', { method: 'POST', body }));
}

export const invitationPreviewQueryOptions = (token: string) =>
  queryOptions({ queryKey: ['invitation-preview', token], queryFn: () => previewInvitation(token) });
export const useInvitationPreview = (token: string) => useQuery(invitationPreviewQueryOptions(token));

export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: meQueryKey }),
  });
}
