// The local stand-in for an S3-compatible object store (s3rver, from the npm registry), on loopback, for
// `npm test`: both app servers keep their uploads in one bucket here, as a real deployment would in S3.
// It runs in a child process of its own: s3rver's logger installs process-wide exception handlers.
import { spawn } from "node:child_process";
import { mkdirSync } from "node:fs";
import { createRequire } from "node:module";
import path from "node:path";
import { fileURLToPath } from "node:url";

const THIS_FILE = fileURLToPath(import.meta.url);
const ROOT = path.resolve(path.dirname(THIS_FILE), "..", "..");
// s3rver's built-in account: the SDK signs every request with these and s3rver checks the signature.
const ACCESS_KEY = "S3RVER";

/** Starts s3rver with one bucket; resolves with the S3_* settings an app server needs and a stop(). */
export async function startS3StandIn({ port, dir, bucket = "throwline-test" }) {
  mkdirSync(dir, { recursive: true });
  const child = spawn(process.execPath, [THIS_FILE, String(port), dir, bucket], {
    cwd: ROOT,
    stdio: ["ignore", "pipe", "inherit"],
  });
  await new Promise((resolve, reject) => {
    let out = "";
    const timer = setTimeout(() => reject(new Error("the S3 stand-in did not start within 30 s")), 30_000);
    child.stdout.on("data", (chunk) => {
      out += chunk;
      if (out.includes("s3-stand-in ready")) {
        clearTimeout(timer);
        resolve();
      }
    });
    child.once("exit", (code) => {
      clearTimeout(timer);
      reject(new Error(`the S3 stand-in exited early (code ${code})`));
    });
  });
  child.stdout.resume();
  return {
    env: {
      S3_ENDPOINT: `http://127.0.0.1:${port}`,
      S3_BUCKET: bucket,
      S3_REGION: "us-east-1",
      S3_ACCESS_KEY_ID: ACCESS_KEY,
      S3_SECRET_ACCESS_KEY: ACCESS_KEY,
      S3_FORCE_PATH_STYLE: "true",
      // The SDK would warn on every start that Node 20 is near its end of support.
      AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: "true",
    },
    stop: () =>
      new Promise((resolve) => {
        if (child.exitCode !== null) return resolve();
        child.once("exit", resolve);
        child.kill("SIGTERM");
      }),
  };
}

// Run as a script: the server itself.
if (process.argv[1] === THIS_FILE) {
  const [port, dir, bucket] = process.argv.slice(2);
  const S3rver = createRequire(path.join(ROOT, "package.json"))("s3rver");
  const server = new S3rver({
    address: "127.0.0.1",
    port: Number(port),
    directory: dir,
    silent: true,
    vhostBuckets: false,
    configureBuckets: [{ name: bucket }],
  });
  await server.run();
  process.stdout.write("s3-stand-in ready\n");
  process.on("SIGTERM", () => server.close().finally(() => process.exit(0)));
}
