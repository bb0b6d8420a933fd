// Runs one vitest suite as a child process and adds its JSON report to a running tally, so that a test
// script can end with one line `N passed, N failed`. Only Node built-ins.
import { spawn } from "node:child_process";
import { existsSync, readFileSync, rmSync } from "node:fs";
import path from "node:path";
import { ROOT, bin } from "./project.mjs";
import { log } from "./system.mjs";

/** A fresh tally. */
export const newTotals = () => ({ passed: 0, failed: 0, skipped: 0 });

/** Adds a suite's JSON report to `totals`; a suite that crashed without a report counts as one failure. */
export function countReport(totals, name, report, code) {
  if (!existsSync(report)) {
    log(`${name}: no report written (exit ${code}); counted as 1 failure.`);
    totals.failed += 1;
    return;
  }
  const r = JSON.parse(readFileSync(report, "utf8"));
  // A file that fails to load has no test results of its own: count it as a failure too.
  const brokenFiles = r.testResults.filter(
    (f) => f.status === "failed" && f.assertionResults.every((a) => a.status !== "failed"),
  ).length;
  totals.passed += r.numPassedTests;
  totals.failed += r.numFailedTests + brokenFiles;
  totals.skipped += r.numPendingTests + r.numTodoTests;
  log(`${name}: ${r.numPassedTests} passed, ${r.numFailedTests + brokenFiles} failed`);
}

/** Runs `files` with `configFile`; the report goes to `resultsDir/<name>.json` and into `totals`. */
export function runVitestSuite({ name, configFile, files, env, resultsDir, totals }) {
  if (files.length === 0) return Promise.resolve(0);
  const report = path.join(resultsDir, `${name}.json`);
  rmSync(report, { force: true });
  return new Promise((resolve) => {
    const child = spawn(
      process.execPath,
      [
        bin("vitest"),
        "run",
        "--reporter=default",
        "--reporter=json",
        `--outputFile.json=${report}`,
        "--config",
        configFile,
        ...files,
      ],
      { cwd: ROOT, stdio: "inherit", env: { ...process.env, ...env, NO_COLOR: "1", FORCE_COLOR: "0" } },
    );
    child.on("exit", (code) => {
      countReport(totals, name, report, code);
      resolve(code);
    });
  });
}
