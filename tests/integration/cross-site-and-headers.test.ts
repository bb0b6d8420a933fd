// The proxy's rules (proxy.ts, lib/http/request-guard.ts) against the real production server.
import { describe, expect, it } from "vitest";
import { ApiSession, BASE_URL, demoProductionId } from "./support/api";

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
    expect((await res.json()).message).toMatch(/another site/);
    const after = await s.get(`/api/productions/${productionId}/positions`);
    expect(after.json).toEqual(before.json);
  });

  it("an upload route, which the proxy leaves to itself, refuses a foreign Origin just the same", async () => {
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
    expect((await res.json()).message).toContain("text/plain");
    expect(res.headers.get("set-cookie")).toBeNull();
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

  it("sends HSTS when a TLS-terminating proxy says the request came over HTTPS", async () => {
    const r = await fetch(`${BASE_URL}/api/health`, { headers: { "x-forwarded-proto": "https" } });
    expect(r.headers.get("strict-transport-security")).toMatch(/max-age=31536000/);
  });
});
