// `npm start` (and `npm run dev`): everything from a fresh clone to a running server, one command.
// Only Node built-ins are imported at the top: node modules may not be installed yet.
import { spawn } from "node:child_process";
import path from "node:path";
import { ensurePackages, log } from "./lib/system.mjs";
import { ensureNodeModules } from "./lib/node-modules.mjs";
import { ensureEnvFile } from "./lib/env-file.mjs";
import { startMariaDb } from "./lib/mariadb.mjs";
import { startMailStandIn } from "./lib/mail-stand-in.mjs";
import {
  KEEP_ALIVE_MS,
  ROOT,
  bin,
  buildIfStale,
  migrate,
  seedWhenEmpty,
  DEMO_PASSWORD,
  DEMO_SIGN_INS,
} from "./lib/project.mjs";

const dev = process.argv.includes("--dev");
const dbOnly = process.argv.includes("--db-only");
const started = Date.now();
const cleanups = [];
let stopping = false;

async function shutdown(code) {
  if (stopping) return;
  stopping = true;
  log("Stopping …");
  for (const fn of cleanups.reverse()) {
    try {
      await fn();
    } catch (err) {
      log(`while stopping: ${err.message}`);
    }
  }
  log("Stopped.");
  process.exit(code);
}
process.on("SIGINT", () => shutdown(0));
process.on("SIGTERM", () => shutdown(0));

async function main() {
  const fileEnv = ensureEnvFile(path.join(ROOT, ".env.local"));
  const settings = { ...fileEnv, ...process.env };
  const useOwnDb = !settings.DATABASE_URL;

  // Chromium: the server prints focus-chart PDFs with Debian's headless Chromium.
  ensurePackages(useOwnDb ? ["mariadb", "mariadbClient", "chromium"] : ["chromium"]);
  ensureNodeModules(ROOT);

  let databaseUrl = settings.DATABASE_URL;
  if (useOwnDb) {
    const port = Number(settings.DB_PORT || 3307);
    log(`Starting MariaDB on 127.0.0.1:${port} (data in .data/mariadb) …`);
    const db = await startMariaDb({
      dir: path.join(ROOT, ".data", "mariadb"),
      port,
      password: settings.DB_PASSWORD || "throwline-local",
    });
    cleanups.push(() => db.stop());
    databaseUrl = db.url;
  }
  const env = { DATABASE_URL: databaseUrl, SESSION_SECRET: settings.SESSION_SECRET, NEXT_TELEMETRY_DISABLED: "1" };
  if (!settings.SMTP_URL) {
    // The local mail stand-in: messages land in .data/outbox, shown on the app's outbox page.
    const mail = await startMailStandIn({
      port: Number(settings.SMTP_PORT || 2525),
      outboxDir: path.join(ROOT, ".data", "outbox"),
    });
    cleanups.push(() => mail.stop());
    Object.assign(env, { SMTP_URL: mail.url, MAIL_OUTBOX_DIR: mail.outboxDir });
    log(`Mail stand-in listening on ${mail.url} (outbox in .data/outbox).`);
  }
  migrate(env);
  await seedWhenEmpty(env);

  if (dbOnly) {
    log(`Database ready: ${databaseUrl} — Ctrl-C to stop.`);
    setInterval(() => {}, 1 << 30); // keep running until a signal stops the database
    return;
  }

  const port = Number(settings.PORT || 3000);
  if (!dev) buildIfStale(".next", env);
  const child = spawn(
    process.execPath,
    [
      bin("next"),
      dev ? "dev" : "start",
      "-p",
      String(port),
      "-H",
      settings.HOST || "127.0.0.1",
      ...(dev ? [] : ["--keepAliveTimeout", String(KEEP_ALIVE_MS)]),
    ],
    {
      cwd: ROOT,
      stdio: ["ignore", "inherit", "inherit"],
      env: { ...process.env, ...env, NODE_ENV: dev ? "development" : "production" },
    },
  );
  cleanups.push(
    () =>
      new Promise((resolve) => {
        if (child.exitCode !== null) return resolve();
        child.once("exit", resolve);
        child.kill("SIGTERM");
      }),
  );
  child.on("exit", (code) => {
    if (!stopping) {
      log(`The app server exited (${code}).`);
      shutdown(code || 1);
    }
  });

  const seconds = ((Date.now() - started) / 1000).toFixed(1);
  log(`Throwline is up at http://localhost:${port} (${seconds} s). Ctrl-C stops everything it started.`);
  log(`Demo sign-ins (password "${DEMO_PASSWORD}" for all, demo data only):`);
  for (const [role, email] of DEMO_SIGN_INS) log(`  ${role.padEnd(14)} ${email}`);
}

main().catch((err) => {
  log(`Could not start: ${err.message}`);
  shutdown(1);
});
