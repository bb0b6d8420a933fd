// A production server (`next start`) of a test build on a loopback port, stopped with the script's other
// cleanups. Only Node built-ins.
import { spawn } from "node:child_process";
import { KEEP_ALIVE_MS, ROOT, bin, freePort, waitForHttp } from "./project.mjs";

/**
 * Starts the build in `distDir` with `env`; resolves with its address once /api/health answers. `nodeArgs`
 * go to Node before Next (a benchmark's --cpu-prof); `onStart` hears the server's pid (its CPU is measured).
 */
export async function startAppServer({ distDir, env, cleanups, timeoutMs = 120_000, nodeArgs = [], onStart }) {
  const port = await freePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  const args = [
    ...nodeArgs,
    bin("next"),
    "start",
    "-p",
    String(port),
    "-H",
    "127.0.0.1",
    "--keepAliveTimeout",
    String(KEEP_ALIVE_MS),
  ];
  const server = spawn(process.execPath, args, {
    cwd: ROOT,
    stdio: ["ignore", "ignore", "inherit"],
    env: { ...process.env, ...env, NEXT_DIST_DIR: distDir, NODE_ENV: "production" },
  });
  cleanups.push(
    () =>
      new Promise((resolve) => {
        if (server.exitCode !== null) return resolve();
        server.once("exit", resolve);
        server.kill("SIGTERM");
      }),
  );
  onStart?.(server.pid);
  await waitForHttp(`${baseUrl}/api/health`, timeoutMs);
  return baseUrl;
}
