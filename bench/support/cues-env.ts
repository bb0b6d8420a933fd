// What bench/cues.ts needs around it, so a newcomer can run `npm run bench:cues` with nothing set:
// without DATABASE_URL it starts a throwaway MariaDB (scripts/lib/mariadb.mjs), migrates and seeds it;
// without APP_URL it starts `next start` from an existing build (BENCH_DIST_DIR, default .next) when
// there is one, and otherwise says how to get the HTTP figures. Everything it starts it stops.
import { existsSync, mkdtempSync, rmSync } from "node:fs";
import { randomBytes } from "node:crypto";
import os from "node:os";
import path from "node:path";

type Stop = () => Promise<void> | void;
const stops: Stop[] = [];

export async function stopAll() {
  for (const stop of stops.reverse()) await stop();
  stops.length = 0;
}

export async function ensureDatabase(): Promise<"given" | "started" | "unavailable"> {
  if (process.env.DATABASE_URL) return "given";
  const { startMariaDb } = await import("../../scripts/lib/mariadb.mjs" as string);
  const { freePort, migrate, seedWhenEmpty } = await import("../../scripts/lib/project.mjs" as string);
  const dir = mkdtempSync(path.join(os.tmpdir(), "throwline-bench-db-"));
  try {
    const db = await startMariaDb({ dir, port: await freePort(), password: randomBytes(12).toString("hex") });
    stops.push(
      () => rmSync(dir, { recursive: true, force: true }),
      () => db.stop(),
    );
    const env = { DATABASE_URL: db.url };
    migrate(env);
    await seedWhenEmpty(env);
    process.env.DATABASE_URL = db.url;
    return "started";
  } catch (err) {
    rmSync(dir, { recursive: true, force: true });
    console.log(
      `Could not start a throwaway MariaDB (${(err as Error).message.split("\n")[0]}); is mariadb-server installed? Database part skipped.`,
    );
    return "unavailable";
  }
}

/** An app to time over HTTP: APP_URL as given, or `next start` from an existing build; null when neither. */
export async function ensureServer(): Promise<string | null> {
  if (process.env.APP_URL) return process.env.APP_URL;
  const { ROOT } = await import("../../scripts/lib/project.mjs" as string);
  const distDir = process.env.BENCH_DIST_DIR ?? ".next";
  if (!existsSync(path.join(ROOT, distDir, "BUILD_ID"))) {
    console.log(
      `  No build in ${distDir} (run \`npm run build\`, or set BENCH_DIST_DIR or APP_URL): HTTP part skipped.`,
    );
    return null;
  }
  const { startAppServer } = await import("../../scripts/lib/app-server.mjs" as string);
  const url: string = await startAppServer({
    distDir,
    env: {
      NEXT_TELEMETRY_DISABLED: "1",
      SESSION_SECRET: process.env.SESSION_SECRET ?? randomBytes(36).toString("base64url"),
    },
    cleanups: stops,
  });
  console.log(`  (started next start from ${distDir} on ${url}; the build must be of this source for fair figures)`);
  return url;
}
