// Reads and creates .env.local. The session secret is generated once per checkout.
import { randomBytes } from "node:crypto";
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { log } from "./system.mjs";

export function parseEnvFile(file) {
  if (!existsSync(file)) return {};
  const out = {};
  for (const line of readFileSync(file, "utf8").split(/\r?\n/)) {
    const m = /^\s*([A-Za-z_][A-Za-z0-9_]*)\s*=\s*(.*?)\s*$/.exec(line);
    if (!m || line.trimStart().startsWith("#")) continue;
    out[m[1]] = m[2].replace(/^(['"])(.*)\1$/, "$2");
  }
  return out;
}

export function ensureEnvFile(file) {
  const current = parseEnvFile(file);
  if (current.SESSION_SECRET && current.SESSION_SECRET.length >= 32) return current;
  const secret = randomBytes(36).toString("base64url");
  const lines = existsSync(file)
    ? readFileSync(file, "utf8")
        .split(/\r?\n/)
        .filter((l) => !/^\s*SESSION_SECRET\s*=/.test(l))
    : ["# Local settings for this checkout. Not committed."];
  lines.push(`SESSION_SECRET=${secret}`);
  writeFileSync(file, lines.filter((l, i, all) => l !== "" || i < all.length - 1).join("\n") + "\n", { mode: 0o600 });
  log(`Created ${file} with a new session secret.`);
  return { ...current, SESSION_SECRET: secret };
}
