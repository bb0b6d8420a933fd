import { defineConfig } from "vitest/config";
import path from "node:path";

const root = path.dirname(new URL(import.meta.url).pathname);

// The Galera cluster suite (`npm run test:cluster`, scripts/test-cluster.mjs): two app servers on a
// three-node cluster that the script started. Nodes take tens of seconds to rejoin, hence the timeouts.
export default defineConfig({
  resolve: { alias: { "@": root } },
  test: {
    include: ["tests/cluster/**/*.test.ts"],
    environment: "node",
    testTimeout: 300_000,
    hookTimeout: 300_000,
    fileParallelism: false,
  },
});
