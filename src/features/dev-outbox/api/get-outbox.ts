import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';

export interface OutboxMessage {
  id: number;
  from: string;
  to: string[];
  subject: string;
  text: string;
  receivedAt: string;
}

/** GET /api/dev/outbox: messages the local mail catcher received, newest first (development only). */
export async function getOutbox(): Promise<OutboxMessage[]> {
  return (await apiFetch<{ messages: OutboxMessage[] }>('/dev/outbox')).messages;
}

export const outboxQueryOptions = () =>
  queryOptions({ queryKey: ['dev-outbox'], queryFn: getOutbox, refetchInterval: 3_000 });
export const useOutbox = () => useQuery(outboxQueryOptions());
