import { QueryClient } from '@tanstack/react-query';
import { ApiRequestError } from './api-request-error';

/** Client errors (4xx) are answers, not glitches: they are not retried. */
export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        retry: (count, error) => !(error instanceof ApiRequestError && error.status < 500) && count < 2,
      },
    },
  });
}
