import { QueryClient, isServer } from "@tanstack/react-query";
import { ApiError } from "@/components/spec/api";

/**
 * The one QueryClient factory, for the browser and for a request on the server. Data stays fresh for
 * 30 s, so a first paint prefetched on the server is not fetched again at once; an answer the server
 * gave on purpose (4xx) is not retried.
 */
export function makeQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        refetchOnWindowFocus: false,
        // On the server a read fails at once (the page shows its 404); in the browser a lost connection is tried twice more.
        retry: isServer ? false : (count, err) => !(err instanceof ApiError && err.status >= 400 && err.status < 500) && count < 2,
      },
    },
  });
}

let browserClient: QueryClient | undefined;

/** In the browser one client for the page's life; on the server a new one per render. */
export function getBrowserQueryClient(): QueryClient {
  if (isServer) return makeQueryClient();
  browserClient ??= makeQueryClient();
  return browserClient;
}
