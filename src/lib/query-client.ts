import { QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-error';

/** Retries only what a retry can fix: network blips and 5xx, never 4xx. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiError && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

/** Creates the app's query client (one per app; tests make their own). */
export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: { staleTime: 30_000, retry: shouldRetry, refetchOnWindowFocus: true },
      mutations: { retry: false },
    },
  });
}

export const queryClient = createQueryClient();
