import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { auditPageSchema } from '../../../../shared/schemas/audit';
import { apiFetch } from '../../../lib/api-client';
import { teamKeys } from './keys';

/** GET /api/teams/:teamId/audit?before= (owners): newest first, one page at a time. */
export async function getAuditPage(teamId: string, before: number | null) {
  const query = before === null ? '' : `?before=${before}`;
  return auditPageSchema.parse(await apiFetch(`/teams/${teamId}/audit${query}`));
}

export const auditQueryOptions = (teamId: string) =>
  infiniteQueryOptions({
    queryKey: teamKeys.audit(teamId),
    queryFn: ({ pageParam }) => getAuditPage(teamId, pageParam),
    initialPageParam: null as number | null,
    getNextPageParam: (page) => page.nextBefore,
  });
export const useAuditLog = (teamId: string, enabled: boolean) =>
  useInfiniteQuery({ ...auditQueryOptions(teamId), enabled });
