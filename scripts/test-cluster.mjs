// `npm run test:cluster`: Throwline on a three-node MariaDB Galera cluster (loopback, throwaway folders),
// with two production app servers, each preferring a different node and failing over to the others
// (DATABASE_FAILOVER_HOSTS). Runs the cluster suite (tests/cluster: cross-node reads, conflicting writes
// on two nodes, a node killed mid-load) and then the integration suite's write paths once through each
// app server. Ends with `N passed, N failed`. Not part of `npm test`: starting three nodes takes a
// minute or two. docs/scaling.md has the results of a run.
import { randomBytes } from "node:crypto";
import { mkdirSync, mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { startGaleraCluster } from "./lib/galera.mjs";
import { startMailStandIn } from "./lib/mail-stand-in.mjs";
import { ensureNodeModules } from "./lib/node-modules.mjs";
import { ROOT, buildIfStale, freePort, migrate, seedWhenEmpty } from "./lib/project.mjs";
import { startAppServer } from "./lib/app-server.mjs";
import { cleanupList } from "./lib/cleanups.mjs";
import { ensurePackages, log } from "./lib/system.mjs";
import { newTotals, runVitestSuite } from "./lib/vitest-run.mjs";

// The integration files whose tests write (fixtures, positions, cues, focus, plot, notes, concurrency).
const WRITE_PATH_FILES = [
  "tests/integration/rig-crud.test.ts",
  "tests/integration/rig-bulk.test.ts",
  "tests/integration/cues.test.ts",
  "tests/integration/focus-api.test.ts",
  "tests/integration/plot-api.test.ts",
  "tests/integration/notes.test.ts",
  "tests/integration/concurrency.test.ts",
];
const RESULTS = path.resolve(ROOT, process.env.TEST_RESULTS_DIR ?? "test-results/cluster");
const DIST_DIR = process.env.TEST_DIST_DIR ?? ".next-test";
const totals = newTotals();
const cleanups = cleanupList();

const freePorts = async (n) => {
  const ports = new Set();
  while (ports.size < n) ports.add(await freePort());
  return [...ports];
};

async function main() {
  mkdirSync(RESULTS, { recursive: true });
  ensurePackages(["mariadb", "mariadbClient", "galera", "rsync", "socketStats"]);
  ensureNodeModules(ROOT);

  const dir = mkdtempSync(path.join(os.tmpdir(), "throwline-cluster-"));
  cleanups.push(() => rmSync(dir, { recursive: true, force: true }));
  const cluster = await startGaleraCluster({
    dir,
    ports: freePorts,
    password: randomBytes(12).toString("hex"),
  });
  cleanups.push(() => cluster.stop());
  const mail = await startMailStandIn({ port: await freePort(), outboxDir: path.join(dir, "outbox") });
  cleanups.push(() => mail.stop());

  const [n1, n2, n3] = cluster.nodes;
  const hostOf = (n) => `127.0.0.1:${n.port}`;
  const shared = {
    SESSION_SECRET: randomBytes(36).toString("base64url"),
    SMTP_URL: mail.url,
    MAIL_OUTBOX_DIR: mail.outboxDir,
    STORAGE_DIR: path.join(dir, "uploads"),
    NEXT_TELEMETRY_DISABLED: "1",
  };
  const viaNode1 = {
    ...shared,
    DATABASE_URL: cluster.urlOf(n1),
    DATABASE_FAILOVER_HOSTS: `${hostOf(n2)},${hostOf(n3)}`,
  };
  const viaNode2 = {
    ...shared,
    DATABASE_URL: cluster.urlOf(n2),
    DATABASE_FAILOVER_HOSTS: `${hostOf(n3)},${hostOf(n1)}`,
  };
  migrate(viaNode1);
  await seedWhenEmpty(viaNode1);

  buildIfStale(DIST_DIR, viaNode1);
  log("Starting app server A (prefers node 1) and app server B (prefers node 2) …");
  const appA = await startAppServer({ distDir: DIST_DIR, env: viaNode1, cleanups });
  const appB = await startAppServer({ distDir: DIST_DIR, env: viaNode2, cleanups });

  // The cluster suite stops and restarts nodes itself: it gets their folders, ports and the app user.
  const clusterEnv = {
    ...viaNode1,
    APP_URL: appA,
    APP_URL_A: appA,
    APP_URL_B: appB,
    TEST_GALERA_CLUSTER: JSON.stringify({
      nodes: cluster.nodes,
      peers: cluster.peers,
      credentials: cluster.credentials,
    }),
  };
  await runVitestSuite({
    name: "cluster",
    configFile: "vitest.cluster.config.mts",
    files: ["tests/cluster"],
    env: clusterEnv,
    resultsDir: RESULTS,
    totals,
  });
  for (const [name, env] of [
    ["write paths via app server A (node 1)", { ...viaNode1, APP_URL: appA }],
    ["write paths via app server B (node 2)", { ...viaNode2, APP_URL: appB }],
  ]) {
    log(`Integration ${name} …`);
    await runVitestSuite({
      name: name.replace(/\W+/g, "-"),
      configFile: "vitest.config.mts",
      files: WRITE_PATH_FILES,
      env,
      resultsDir: RESULTS,
      totals,
    });
  }
}

let exitCode = 1;
try {
  await main();
} catch (err) {
  log(`The cluster run stopped early: ${err.stack ?? err.message}`);
  totals.failed += 1;
} finally {
  await cleanups.run();
  const skipped = totals.skipped ? `, ${totals.skipped} skipped` : "";
  process.stdout.write(`\n${totals.passed} passed, ${totals.failed} failed${skipped}\n`);
  exitCode = totals.failed === 0 && totals.passed > 0 ? 0 : 1;
}
process.exit(exitCode);
