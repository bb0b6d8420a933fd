// The API's route handlers as the file tree declares them, for sweeps that must cover every route
// (the authorization matrix, the cross-site refusal): a new route is in the sweep without being listed.
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";

/** Every exported method of every route.ts under app/api, as "METHOD /api/…" with [param] folders kept. */
export function routeTree(): string[] {
  const root = path.resolve("app/api");
  const out: string[] = [];
  for (const rel of readdirSync(root, { recursive: true }).map(String)) {
    if (!rel.endsWith("route.ts")) continue;
    const src = readFileSync(path.join(root, rel), "utf8");
    const url = `/api/${path.dirname(rel)}`.replace(/\/\.$/, "").replaceAll(path.sep, "/");
    const methods = new Set<string>();
    for (const m of src.matchAll(/export\s+(?:const|async function|function)\s+(GET|POST|PUT|PATCH|DELETE)\b/g))
      methods.add(m[1]);
    for (const m of src.matchAll(/export\s+const\s*\{([^}]*)\}/g))
      for (const name of m[1].split(","))
        if (/^(GET|POST|PUT|PATCH|DELETE)$/.test(name.trim())) methods.add(name.trim());
    for (const method of methods) out.push(`${method} ${url}`);
  }
  return out.sort();
}
