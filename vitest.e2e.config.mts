import { defineConfig } from "vitest/config";
import path from "node:path";

const root = path.dirname(new URL(import.meta.url).pathname);

// End-to-end suite: drives Debian's Chromium (playwright-core, no browser download) against the
// server that scripts/test.mjs built and started (APP_URL).
export default defineConfig({
  resolve: { alias: { "@": root } },
  test: {
    include: ["tests/e2e/**/*.test.ts"],
    environment: "node",
    // A guard against a hung browser, not a speed goal (those are npm run bench:*): on a loaded
    // two-core machine the longest tests take over a minute.
    testTimeout: 180_000,
    hookTimeout: 180_000,
    fileParallelism: false,
    // A loaded machine answers in seconds, not vitest's default of one: expect.poll waits up to 20 s.
    expect: { poll: { timeout: 20_000, interval: 100 } },
  },
});
