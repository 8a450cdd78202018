import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { invitationSchema } from '../../../../shared/schemas/invitation';
import { apiFetch } from '../../../lib/api-client';
import { teamKeys } from './keys';

/** GET /api/teams/:teamId/invitations: pending ones (owners). */
export async function getInvitations(teamId: string) {
  return z.array(invitationSchema).parse(await apiFetch(`/teams/${teamId}/invitations`));
}

export const invitationsQueryOptions = (teamId: string) =>
  queryOptions({ queryKey: teamKeys.invitations(teamId), queryFn: () => getInvitations(teamId) });
export const useInvitations = (teamId: string, enabled: boolean) =>
  useQuery({ ...invitationsQueryOptions(teamId), enabled });
