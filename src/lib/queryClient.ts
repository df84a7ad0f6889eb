import { QueryClient } from '@tanstack/react-query';
import { isApiError } from './apiClient';

/** One QueryClient per app (and a fresh one per test): client errors (4xx) are not retried, others once. */
export function createQueryClient(overrides?: { retry?: boolean }): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        refetchOnWindowFocus: false,
        retry:
          overrides?.retry === false
            ? false
            : (failureCount, error) => {
                if (isApiError(error) && error.status >= 400 && error.status < 500) return false;
                return failureCount < 1;
              },
      },
      mutations: { retry: false },
    },
  });
}
