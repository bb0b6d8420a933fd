import { QueryClient, defaultShouldDehydrateQuery } from "@tanstack/react-query";

/** One factory for the server (a new client per request) and the browser (one per tab). */
export function makeQueryClient() {
  return new QueryClient({
    defaultOptions: {
      queries: { staleTime: 30_000, retry: 1 },
      dehydrate: { shouldDehydrateQuery: (q) => defaultShouldDehydrateQuery(q) || q.state.status === "pending" },
    },
  });
}
