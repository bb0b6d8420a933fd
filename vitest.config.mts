import { defineConfig } from "vitest/config";
import path from "node:path";

const root = path.dirname(new URL(import.meta.url).pathname);

// Unit and integration suites. The end-to-end suite has its own config (vitest.e2e.config.mts)
// because it needs a built server and a browser.
export default defineConfig({
  resolve: {
    alias: {
      "@": root,
      // 'server-only' throws outside React Server Components; tests run data code directly.
      "server-only": path.join(root, "tests/support/server-only-stub.ts"),
    },
  },
  test: {
    include: ["tests/unit/**/*.test.ts", "tests/integration/**/*.test.ts"],
    environment: "node",
    testTimeout: 30_000,
    hookTimeout: 60_000,
    fileParallelism: false,
  },
});
