// For bench:plot: a throwaway MariaDB (migrated, demo-seeded) and `next start` from a build in its
// own folder — the same steps as the test runner — unless APP_URL and DATABASE_URL point at a running one.
import { spawn, type ChildProcess } from "node:child_process";
import { randomBytes } from "node:crypto";
import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
// @ts-expect-error plain ES modules without types (Node built-ins only, shared with the runners)
import { startMariaDb } from "../scripts/lib/mariadb.mjs";
// @ts-expect-error plain ES modules without types
import { bin, buildIfStale, freePort, migrate, seedWhenEmpty, waitForHttp } from "../scripts/lib/project.mjs";

export type Server = { appUrl: string; databaseUrl: string; stop(): Promise<void> };

export async function startServer(): Promise<Server> {
  if (process.env.APP_URL && process.env.DATABASE_URL) {
    return { appUrl: process.env.APP_URL, databaseUrl: process.env.DATABASE_URL, stop: async () => {} };
  }
  const dir = mkdtempSync(path.join(os.tmpdir(), "throwline-bench-"));
  const db = await startMariaDb({ dir, port: await freePort(), password: randomBytes(12).toString("hex") });
  const env = {
    DATABASE_URL: db.url,
    SESSION_SECRET: randomBytes(36).toString("base64url"),
    STORAGE_DIR: path.join(dir, "uploads"),
    NEXT_TELEMETRY_DISABLED: "1",
  };
  migrate(env);
  await seedWhenEmpty(env);
  const distDir = process.env.BENCH_DIST_DIR ?? ".next-bench-plot";
  buildIfStale(distDir, env);
  const port = await freePort();
  const server: ChildProcess = spawn(process.execPath, [bin("next"), "start", "-p", String(port), "-H", "127.0.0.1"], {
    stdio: ["ignore", "ignore", "inherit"],
    env: { ...process.env, ...env, NEXT_DIST_DIR: distDir, NODE_ENV: "production" },
  });
  const appUrl = `http://127.0.0.1:${port}`;
  await waitForHttp(`${appUrl}/api/health`);
  return {
    appUrl,
    databaseUrl: db.url,
    async stop() {
      await new Promise<void>((resolve) => {
        if (server.exitCode !== null) return resolve();
        server.once("exit", () => resolve());
        server.kill("SIGTERM");
      });
      await db.stop();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}
