import { QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-client';

/** One query client for the app; client errors (4xx) are not retried, they will not fix themselves. */
export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        retry: (failures, error) =>
          !(error instanceof ApiError && error.status >= 400 && error.status < 500) && failures < 2,
      },
    },
  });
}
