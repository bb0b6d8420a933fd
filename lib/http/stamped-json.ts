import "server-only";
import { createHash, randomBytes } from "node:crypto";
import { readFileSync } from "node:fs";
import path from "node:path";

/**
 * JSON answers for reads that are costly to build but cheap to fingerprint. The caller reads a stamp
 * (a short text that changes whenever anything the answer depends on changes, such as
 * `fixtureListStamp`) and the answer is built once per stamp and kept here as bytes, so a repeat
 * read costs the stamp's query and a copy of bytes. The stamp must be read before the data the build
 * reads, so an answer is never filed under a newer stamp than its own data.
 *
 * The ETag lets a polling client (a browser does this by itself: the answer says `no-cache`) ask
 * whether anything changed and get a 304 with no body. Each app server keeps its own copies; with
 * several servers the stamp comes from the shared database, so none of them can answer stale.
 */

type Entry = { stamp: string; etag: string; body: Buffer };

/** Bytes kept over all entries; the least recently used go first. A 1,500-unit rig list is about 3.5 MB. */
const MAX_BYTES = 96 * 1024 * 1024;
const entries = new Map<string, Entry>();
const building = new Map<string, Promise<Entry>>();
let keptBytes = 0;

/** Tells one build of the app from another, so a browser never keeps an answer shaped by an older one. */
const BUILD = (() => {
  try {
    return readFileSync(path.join(process.cwd(), process.env.NEXT_DIST_DIR || ".next", "BUILD_ID"), "utf8").trim();
  } catch {
    return randomBytes(8).toString("hex");
  }
})();

const sizeOf = (e: Entry) => e.body.length;

function keep(key: string, entry: Entry) {
  const old = entries.get(key);
  if (old) keptBytes -= sizeOf(old);
  entries.delete(key);
  entries.set(key, entry);
  keptBytes += sizeOf(entry);
  for (const [k, e] of entries) {
    if (keptBytes <= MAX_BYTES || k === key) break;
    entries.delete(k);
    keptBytes -= sizeOf(e);
  }
}

async function entryFor(key: string, stamp: string, build: () => Promise<unknown>): Promise<Entry> {
  const kept = entries.get(key);
  if (kept?.stamp === stamp) {
    keep(key, kept); // most recently used
    return kept;
  }
  // Callers arriving while the same answer is being built wait for it instead of building it again.
  const id = `${key}\n${stamp}`;
  let pending = building.get(id);
  if (!pending) {
    pending = (async () => {
      const body = Buffer.from(JSON.stringify(await build()));
      const etag = `"${createHash("sha256").update(`${BUILD}\n${key}\n${stamp}`).digest("base64url").slice(0, 32)}"`;
      const entry: Entry = { stamp, etag, body };
      keep(key, entry);
      return entry;
    })().finally(() => building.delete(id));
    building.set(id, pending);
  }
  return pending;
}

/** A view of kept bytes for a response body (the response copies what it sends; the kept copy stays whole). */
const bytes = (b: Buffer) => new Uint8Array(b.buffer as ArrayBuffer, b.byteOffset, b.length);

/** True when an If-None-Match header names this ETag (weak or strong, in a list, or `*`). */
export function etagMatches(ifNoneMatch: string | null, etag: string): boolean {
  if (!ifNoneMatch) return false;
  return ifNoneMatch.split(",").some((t) => {
    const tag = t.trim().replace(/^W\//, "");
    return tag === "*" || tag === etag;
  });
}

/**
 * The answer for `key` at `stamp`: 304 when the client already has it, otherwise the JSON. `build`
 * runs only when this server holds no answer for the stamp.
 */
export async function stampedJson(
  req: Request,
  { key, stamp, build }: { key: string; stamp: string; build: () => Promise<unknown> },
): Promise<Response> {
  const entry = await entryFor(key, stamp, build);
  const headers: Record<string, string> = {
    ETag: entry.etag,
    // Private (for members only) and asked again every time: the 304 makes asking cheap.
    "Cache-Control": "private, no-cache",
  };
  if (etagMatches(req.headers.get("if-none-match"), entry.etag)) return new Response(null, { status: 304, headers });
  // Next drops a route's own Content-Encoding and compresses for clients that ask, so plain bytes go out.
  return new Response(bytes(entry.body), { headers: { ...headers, "Content-Type": "application/json" } });
}
