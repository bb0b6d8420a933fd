// Installs node modules when they are missing or older than package-lock.json.
import { createHash } from "node:crypto";
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";
import { log, run } from "./system.mjs";

export function ensureNodeModules(root) {
  const lock = path.join(root, "package-lock.json");
  const stampFile = path.join(root, "node_modules", ".throwline-lock-hash");
  const hash = createHash("sha256").update(readFileSync(lock)).digest("hex");
  if (existsSync(stampFile) && readFileSync(stampFile, "utf8") === hash) return;
  const fresh = !existsSync(path.join(root, "node_modules"));
  log(fresh ? "Installing node modules (npm ci) …" : "package-lock.json changed: updating node modules …");
  run("npm", fresh ? ["ci", "--no-audit", "--no-fund"] : ["install", "--no-audit", "--no-fund"], { cwd: root });
  writeFileSync(stampFile, hash);
}
