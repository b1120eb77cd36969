import { MutationCache, QueryCache, QueryClient } from "@tanstack/react-query";
import { isApiError } from "./api-client.ts";

/** Set `meta: { ignoreUnauthenticated: true }` on a query or mutation whose 401 is expected (sign-in). */
export interface AuthAwareMeta extends Record<string, unknown> {
  ignoreUnauthenticated?: boolean;
}

export interface QueryClientHooks {
  /** Called when any request reports that the session is gone (401). The app routes to sign-in. */
  onUnauthenticated: () => void;
}

/** Client errors will not change on a retry; network faults and 5xx replies might. */
export function shouldRetry(failureCount: number, error: unknown): boolean {
  if (isApiError(error) && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

export function isUnauthenticated(error: unknown): boolean {
  return isApiError(error) && error.status === 401;
}

export function createQueryClient(hooks: QueryClientHooks): QueryClient {
  const handle = (error: unknown, meta: Record<string, unknown> | undefined) => {
    if (isUnauthenticated(error) && !(meta as AuthAwareMeta | undefined)?.ignoreUnauthenticated) hooks.onUnauthenticated();
  };
  return new QueryClient({
    queryCache: new QueryCache({ onError: (error, query) => handle(error, query.meta) }),
    mutationCache: new MutationCache({ onError: (error, _vars, _ctx, mutation) => handle(error, mutation.meta) }),
    defaultOptions: {
      queries: { retry: shouldRetry, staleTime: 30_000, refetchOnWindowFocus: true },
      mutations: { retry: false },
    },
  });
}
