// Shared steps of `npm start`, `npm run dev` and `npm test`: database bootstrap, migrations, seed, build.
import { createHash } from "node:crypto";
import { existsSync, readdirSync, readFileSync, statSync, writeFileSync } from "node:fs";
import { createRequire } from "node:module";
import net from "node:net";
import path from "node:path";
import { log, run } from "./system.mjs";

export const ROOT = path.resolve(path.dirname(new URL(import.meta.url).pathname), "..", "..");

export function bin(name) {
  const table = {
    next: "node_modules/next/dist/bin/next",
    sequelize: "node_modules/sequelize-cli/lib/sequelize",
    vitest: "node_modules/vitest/vitest.mjs",
  };
  return path.join(ROOT, table[name]);
}

export function migrate(env) {
  log("Running migrations …");
  run(process.execPath, [bin("sequelize"), "db:migrate"], { cwd: ROOT, env: { ...process.env, ...env } });
}

/** Seeds the demo production unless the database already has users. */
export async function seedWhenEmpty(env) {
  const mariadb = createRequire(path.join(ROOT, "package.json"))("mariadb");
  const conn = await mariadb.createConnection(env.DATABASE_URL);
  let count;
  try {
    const rows = await conn.query("SELECT COUNT(*) AS n FROM users");
    count = Number(rows[0].n);
  } finally {
    await conn.end();
  }
  if (count > 0) return false;
  log("Empty database: seeding the demo production …");
  run(process.execPath, [bin("sequelize"), "db:seed:all"], { cwd: ROOT, env: { ...process.env, ...env } });
  return true;
}

const SOURCE_DIRS = ["app", "components", "hooks", "lib", "models", "public"];
const SOURCE_FILES = [
  "package-lock.json",
  "next.config.ts",
  "tailwind.config.ts",
  "postcss.config.mjs",
  "tsconfig.json",
  "proxy.ts",
  "instrumentation.ts",
];

/** A fingerprint of everything the build reads, to rebuild only when something changed. */
export function sourceFingerprint() {
  const hash = createHash("sha256");
  const visit = (p) => {
    if (!existsSync(p)) return;
    const st = statSync(p);
    if (st.isDirectory()) {
      for (const name of readdirSync(p).sort()) visit(path.join(p, name));
    } else {
      hash.update(path.relative(ROOT, p));
      hash.update(readFileSync(p));
    }
  };
  for (const d of SOURCE_DIRS) visit(path.join(ROOT, d));
  for (const f of SOURCE_FILES) visit(path.join(ROOT, f));
  return hash.digest("hex");
}

export function buildIfStale(distDir, env = {}) {
  const stamp = path.join(ROOT, distDir, "throwline-source.sha256");
  const fingerprint = sourceFingerprint();
  if (
    existsSync(path.join(ROOT, distDir, "BUILD_ID")) &&
    existsSync(stamp) &&
    readFileSync(stamp, "utf8") === fingerprint
  ) {
    log("Build is up to date.");
    return;
  }
  log("Building the app (next build) …");
  run(process.execPath, [bin("next"), "build"], {
    cwd: ROOT,
    env: { ...process.env, ...env, NEXT_DIST_DIR: distDir, NEXT_TELEMETRY_DISABLED: "1" },
  });
  writeFileSync(stamp, fingerprint);
}

/**
 * `next start`'s idle keep-alive, in ms: past Node's 5 s, so a client that reuses a socket after a pause
 * (a browser, a test between steps, a proxy in front) does not race the server closing it and get a reset.
 * 65 s outlasts the 60 s idle timeout common in load balancers (common practice; no standard sets it).
 */
export const KEEP_ALIVE_MS = 65_000;

export function freePort() {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.unref();
    srv.on("error", reject);
    srv.listen(0, "127.0.0.1", () => {
      const { port } = srv.address();
      srv.close(() => resolve(port));
    });
  });
}

export async function waitForHttp(url, timeoutMs = 60_000) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    try {
      const res = await fetch(url);
      if (res.ok) return;
    } catch {
      // not up yet
    }
    if (Date.now() > deadline) throw new Error(`${url} did not answer within ${timeoutMs / 1000} s`);
    await new Promise((r) => setTimeout(r, 250));
  }
}

export const DEMO_SIGN_INS = [
  ["designer", "maren.oduya@quillmere.test"],
  ["electrician", "teodor.brask@quillmere.test"],
  ["stage manager", "ines.calloway@quillmere.test"],
  ["viewer", "rafe.lindqvist@quillmere.test"],
];
export const DEMO_PASSWORD = "lantern-demo-2026";
