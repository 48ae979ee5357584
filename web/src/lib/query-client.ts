import { QueryClient } from '@tanstack/react-query';
import { isApiError } from './api-client';

/** Retry only what a retry can fix (network failures, 5xx); a 4xx answer will not change by asking again. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (isApiError(error) && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: { staleTime: 30_000, retry: shouldRetry },
      mutations: { retry: false },
    },
  });
}
