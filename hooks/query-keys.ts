// Query keys shared by server prefetching and the client hooks (kept out of "use client" files so
// Server Components can import them).
export const productionKeys = {
  all: ["productions"] as const,
  list: () => [...productionKeys.all, "list"] as const,
  detail: (id: number) => [...productionKeys.all, id] as const,
  fixtures: (id: number) => [...productionKeys.all, id, "fixtures"] as const,
  fixtureTypes: (id: number) => [...productionKeys.all, id, "fixture-types"] as const,
  accessories: (id: number) => [...productionKeys.all, id, "accessories"] as const,
  cues: (id: number) => [...productionKeys.all, id, "cues"] as const,
  cueSheet: (id: number) => [...productionKeys.all, id, "cues", "sheet"] as const,
  // Everything the plot draws in one read, and the change token it polls for live updates.
  plot: (id: number) => [...productionKeys.all, id, "plot"] as const,
  plotStamp: (id: number) => [...productionKeys.all, id, "plot-stamp"] as const,
};
