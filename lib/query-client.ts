import { QueryCache, QueryClient } from '@tanstack/react-query';
import { isApiRequestError } from '@/lib/api/client';
import { authKeys } from '@/lib/api/auth';

/** A request the server refused for a reason a retry cannot change (4xx): do not repeat it. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (isApiRequestError(error) && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

/**
 * The app's QueryClient. A 401 on any query means the session ended (expired, signed out in another
 * tab): mark the user signed out so the layouts send them to sign-in.
 */
export function createQueryClient(): QueryClient {
  const client: QueryClient = new QueryClient({
    queryCache: new QueryCache({
      onError: (error) => {
        if (isApiRequestError(error) && error.status === 401) client.setQueryData(authKeys.me(), null);
      },
    }),
    defaultOptions: {
      queries: { retry: shouldRetry, refetchOnWindowFocus: true },
      mutations: { retry: false },
    },
  });
  return client;
}
