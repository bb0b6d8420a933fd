// The request guard's rules (lib/http/request-guard.ts) against the real production server: pages meet
// them in proxy.ts, the API in every route handler's wrapper (lib/http/respond.ts) and next.config.ts.
import { describe, expect, it } from "vitest";
import { ApiSession, BASE_URL, demoProductionId } from "./support/api";
import { routeTree } from "./support/route-tree";

const DESIGNER = "maren.oduya@quillmere.test";

describe("cross-site writes are refused before they reach a handler", () => {
  it("a signed-in session's cookie posted from another origin changes nothing (403)", async () => {
    const s = await new ApiSession().signIn(DESIGNER);
    const productionId = await demoProductionId(s);
    const cookie = (s as unknown as { cookie: string }).cookie;
    const before = await s.get(`/api/productions/${productionId}/positions`);
    const res = await fetch(`${BASE_URL}/api/productions/${productionId}/positions`, {
      method: "POST",
      headers: { cookie, origin: "http://127.0.0.1:1", "content-type": "application/json" },
      body: JSON.stringify({ name: "From elsewhere", kind: "overhead_pipe" }),
    });
    expect(res.status).toBe(403);
    expect((await res.json()).error.message).toMatch(/another site/);
    const after = await s.get(`/api/productions/${productionId}/positions`);
    expect(after.json).toEqual(before.json);
  });

  it("an upload route refuses a foreign Origin before it reads the file", async () => {
    const s = await new ApiSession().signIn(DESIGNER);
    const productionId = await demoProductionId(s);
    const form = new FormData();
    form.append("file", new Blob([new Uint8Array([0x89, 0x50, 0x4e, 0x47])], { type: "image/png" }), "x.png");
    const res = await fetch(`${BASE_URL}/api/productions/${productionId}/uploads`, {
      method: "POST",
      headers: { cookie: s.cookie, origin: "http://127.0.0.1:1" },
      body: form,
    });
    expect(res.status).toBe(403);
  });

  it("a text/plain body (what a plain cross-site form can send) is 415, naming the type", async () => {
    const res = await fetch(`${BASE_URL}/api/auth/sign-in`, {
      method: "POST",
      headers: { "content-type": "text/plain" },
      body: JSON.stringify({ email: DESIGNER, password: "lantern-demo-2026" }),
    });
    expect(res.status).toBe(415);
    expect((await res.json()).error.message).toContain("text/plain");
    expect(res.headers.get("set-cookie")).toBeNull();
  });

  it("every write method of every API route refuses a foreign Origin before its handler runs", async () => {
    const s = await new ApiSession().signIn(DESIGNER);
    const productionId = await demoProductionId(s);
    const writes = routeTree().filter((r) => !r.startsWith("GET "));
    expect(writes.length).toBeGreaterThan(40);
    const missed: string[] = [];
    for (const row of writes) {
      const [method, pattern] = row.split(" ");
      // Ids that do not exist: were the refusal not first, the answer would be a 400 or 404 instead.
      const url = pattern.replace(/\[(\w+)\]/g, (_, name: string) =>
        name === "productionId" ? String(productionId) : "2147483000",
      );
      const res = await fetch(BASE_URL + url, {
        method,
        headers: { cookie: s.cookie, origin: "https://elsewhere.test", "content-type": "application/json" },
        body: "{}",
      });
      const body = await res.json().catch(() => null);
      if (res.status !== 403 || !/another site/.test(body?.error?.message ?? "")) missed.push(`${row} → ${res.status}`);
    }
    expect(missed).toEqual([]);
  });

  it("a fixture edit sent as text/plain is 415 and changes nothing", async () => {
    const s = await new ApiSession().signIn(DESIGNER);
    const productionId = await demoProductionId(s);
    const [fixture] = (await s.get(`/api/productions/${productionId}/fixtures`)).json.fixtures;
    const res = await fetch(`${BASE_URL}/api/productions/${productionId}/fixtures/${fixture.id}`, {
      method: "PATCH",
      headers: { cookie: s.cookie, "content-type": "text/plain" },
      body: JSON.stringify({ version: fixture.version, notes: "sent as text" }),
    });
    expect(res.status).toBe(415);
    const now = (await s.get(`/api/productions/${productionId}/fixtures/${fixture.id}`)).json.fixture;
    expect(now.version).toBe(fixture.version);
  });

  it("a server action posted with a foreign Origin is 403, not a 500", async () => {
    const res = await fetch(`${BASE_URL}/sign-in`, {
      method: "POST",
      headers: {
        origin: "http://elsewhere.test",
        "next-action": "0123456789abcdef",
        "content-type": "text/plain;charset=UTF-8",
      },
      body: "[]",
    });
    expect(res.status).toBe(403);
  });
});

describe("security headers", () => {
  it("a page carries a fresh script nonce, no framing, nosniff and a referrer policy", async () => {
    const a = await fetch(`${BASE_URL}/sign-in`);
    const b = await fetch(`${BASE_URL}/sign-in`);
    const csp = a.headers.get("content-security-policy") ?? "";
    const nonce = /'nonce-([^']+)'/.exec(csp)?.[1];
    expect(nonce).toBeTruthy();
    expect(b.headers.get("content-security-policy")).not.toContain(nonce!);
    expect(csp).toContain("frame-ancestors 'none'");
    expect(a.headers.get("x-content-type-options")).toBe("nosniff");
    expect(a.headers.get("referrer-policy")).toBe("strict-origin-when-cross-origin");
    // Every inline script in the page carries the nonce, or the browser would refuse to run it.
    const html = await a.text();
    const scripts = [...html.matchAll(/<script\b([^>]*)>/g)].map((m) => m[1]);
    expect(scripts.length).toBeGreaterThan(0);
    for (const attrs of scripts) expect(attrs).toContain(`nonce="${nonce}"`);
    // Plain HTTP: no HSTS.
    expect(a.headers.get("strict-transport-security")).toBeNull();
  });

  it("an API answer carries the strictest policy (it runs no script) and the same headers as a page", async () => {
    const r = await fetch(`${BASE_URL}/api/health`);
    expect(r.headers.get("content-security-policy")).toBe("default-src 'none'; frame-ancestors 'none'");
    expect(r.headers.get("x-content-type-options")).toBe("nosniff");
    expect(r.headers.get("referrer-policy")).toBe("strict-origin-when-cross-origin");
    expect(r.headers.get("x-frame-options")).toBe("DENY");
  });

  it("an API path that does not exist, and an API error, carry the same headers", async () => {
    for (const r of [
      await fetch(`${BASE_URL}/api/no-such-thing`),
      await fetch(`${BASE_URL}/api/productions/1/fixtures`),
    ]) {
      expect(r.status).toBeGreaterThanOrEqual(400);
      expect(r.headers.get("content-security-policy")).toBe("default-src 'none'; frame-ancestors 'none'");
      expect(r.headers.get("x-content-type-options")).toBe("nosniff");
    }
  });

  it("sends HSTS when a TLS-terminating proxy says the request came over HTTPS, on pages and the API", async () => {
    for (const url of ["/api/health", "/sign-in"]) {
      const r = await fetch(`${BASE_URL}${url}`, { headers: { "x-forwarded-proto": "https" } });
      expect(r.headers.get("strict-transport-security"), url).toMatch(/max-age=31536000/);
      expect((await fetch(`${BASE_URL}${url}`)).headers.get("strict-transport-security"), url).toBeNull();
    }
  });
});
