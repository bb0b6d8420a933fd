// Two app servers on one MariaDB and one S3 bucket (the runner starts the second; APP_URL_SECOND), as
// behind a load balancer with no sticky sessions: whatever one server knows, the other must know too.
import { readdirSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { SIGN_IN_LIMITS } from "@/lib/auth/sign-in-limits";
import { makePng } from "../support/png";
import { BASE_URL, freshUser } from "./support/api";

const A = BASE_URL;
const B = process.env.APP_URL_SECOND ?? "";
const address = () => `203.0.113.${Math.floor(Math.random() * 250) + 1}-${Date.now()}`;

async function signIn(server: string, email: string, password: string, from = address()) {
  const res = await fetch(`${server}/api/auth/sign-in`, {
    method: "POST",
    headers: { "content-type": "application/json", "x-forwarded-for": from },
    body: JSON.stringify({ email, password }),
  });
  return { status: res.status, json: await res.json(), cookie: res.headers.getSetCookie()[0]?.split(";")[0] ?? "" };
}

const me = (server: string, cookie: string) =>
  fetch(`${server}/api/auth/me`, { headers: { cookie } }).then(async (r) => ({
    status: r.status,
    json: await r.json(),
  }));

const send = (server: string, cookie: string, method: string, path: string, body?: unknown) =>
  fetch(server + path, {
    method,
    headers: { cookie, ...(body === undefined ? {} : { "content-type": "application/json" }) },
    body: body === undefined ? undefined : JSON.stringify(body),
  }).then(async (r) => ({ status: r.status, json: await r.json() }));

describe("two app servers share sessions, limits, rows and uploads", () => {
  it("runs against two different servers", () => {
    expect(B, "APP_URL_SECOND is set by `npm test` (scripts/test.mjs)").toMatch(/^http:\/\/127\.0\.0\.1:\d+$/);
    expect(B).not.toBe(A);
  });

  it("a session signed in on one server is valid on the other", async () => {
    const { email, user } = await freshUser("two-servers-session");
    const onA = await signIn(A, email, "a-long-test-password");
    expect(onA.status).toBe(200);
    const fromB = await me(B, onA.cookie);
    expect(fromB.status).toBe(200);
    expect(JSON.stringify(fromB.json)).toContain(email);
    expect(JSON.stringify(fromB.json)).toContain(String(user.id));
  });

  it("signing out on one server ends the session on both", async () => {
    const { email } = await freshUser("two-servers-out");
    const s = await signIn(B, email, "a-long-test-password");
    expect((await me(A, s.cookie)).status).toBe(200);
    const out = await fetch(`${A}/api/auth/sign-out`, { method: "POST", headers: { cookie: s.cookie } });
    expect(out.status).toBe(200);
    // The same cookie replayed to either server is signed out.
    expect((await me(B, s.cookie)).status).toBe(401);
    expect((await me(A, s.cookie)).status).toBe(401);
  });

  it("the sign-in limit counts failed attempts made on both servers together", async () => {
    const { email } = await freshUser("two-servers-limit");
    const limit = SIGN_IN_LIMITS.account.failures;
    // Alternate servers: neither alone sees enough failures to refuse.
    for (let i = 0; i < limit; i++) {
      expect((await signIn(i % 2 ? B : A, email, `wrong-guess-${i}`)).status).toBe(401);
    }
    for (const server of [A, B]) {
      const blocked = await signIn(server, email, "a-long-test-password");
      expect(blocked.status, server).toBe(429);
      expect(blocked.json.error.message).toMatch(/Try again in \d+ s/);
    }
  });

  it("an underlay uploaded through one server is served, changed and deleted through the other", async () => {
    const { session } = await freshUser("two-servers-upload");
    const cookie = session.cookie;
    const created = await send(A, cookie, "POST", "/api/productions", { name: "Two servers" });
    const pid = created.json.production.id as number;

    const form = new FormData();
    const png = makePng(64, 48);
    form.set("file", new Blob([png as unknown as ArrayBuffer], { type: "image/png" }), "plan.png");
    const up = await fetch(`${A}/api/productions/${pid}/uploads`, { method: "POST", body: form, headers: { cookie } });
    expect(up.status).toBe(201);
    const upload = (await up.json()).upload;

    const fileFrom = async (server: string) => {
      const r = await fetch(server + upload.url, { headers: { cookie } });
      return { status: r.status, bytes: Buffer.from(await r.arrayBuffer()) };
    };
    const [a, b] = [await fileFrom(A), await fileFrom(B)];
    expect(b.status).toBe(200);
    expect(b.bytes.equals(a.bytes)).toBe(true);
    expect(b.bytes.byteLength).toBe(upload.sizeBytes);

    // The bytes live in the bucket, not on either server's disk.
    const localDir = process.env.STORAGE_DIR ?? "";
    const onDisk = (() => {
      try {
        return readdirSync(localDir, { recursive: true }).map(String);
      } catch {
        return [];
      }
    })();
    expect(onDisk.filter((f) => f.startsWith(`p${pid}/`))).toEqual([]);

    // A versioned change on B is seen by A, and A's stale copy is refused with the current row.
    const moved = await send(B, cookie, "PATCH", `/api/productions/${pid}/uploads/${upload.id}`, {
      version: upload.version,
      opacity: 0.4,
    });
    expect(moved.status).toBe(200);
    const stale = await send(A, cookie, "PATCH", `/api/productions/${pid}/uploads/${upload.id}`, {
      version: upload.version,
      opacity: 0.9,
    });
    expect(stale.status).toBe(409);
    expect(JSON.stringify(stale.json)).toContain('"opacity":0.4');

    expect((await send(B, cookie, "DELETE", `/api/productions/${pid}/uploads/${upload.id}`)).status).toBeLessThan(300);
    expect((await fileFrom(A)).status).toBe(404);
  });
});
