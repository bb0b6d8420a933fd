"use client";

import { QueryClientProvider, isServer, type QueryClient } from "@tanstack/react-query";
import { makeQueryClient } from "@/lib/query/query-client";

let browserClient: QueryClient | undefined;

function getQueryClient() {
  if (isServer) return makeQueryClient();
  browserClient ??= makeQueryClient();
  return browserClient;
}

export function Providers({ children }: { children: React.ReactNode }) {
  return <QueryClientProvider client={getQueryClient()}>{children}</QueryClientProvider>;
}
