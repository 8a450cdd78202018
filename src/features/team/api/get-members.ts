import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { memberSchema } from '../../../../shared/schemas/team';
import { apiFetch } from '../../../lib/api-client';
import { teamKeys } from './keys';

/** GET /api/teams/:teamId/members. */
export async function getMembers(teamId: string) {
  return z.array(memberSchema).parse(await apiFetch(`/teams/${teamId}/members`));
}

export const membersQueryOptions = (teamId: string) =>
  queryOptions({ queryKey: teamKeys.members(teamId), queryFn: () => getMembers(teamId) });
export const useMembers = (teamId: string) => useQuery(membersQueryOptions(teamId));
