// The query key of "the latest revision and what changed since it", apart from the client hook so the
// server pages can put the answer in the cache they hand over (the marks then draw with the first paint).
import { productionKeys } from "./query-keys";

export const latestRevisionKey = (productionId: number, of: "fixtures" | "cues") =>
  [
    ...(of === "fixtures" ? productionKeys.fixtures(productionId) : productionKeys.cues(productionId)),
    "since-revision",
  ] as const;
