import { describe, expect, it } from "vitest";
import {
  contentSecurityPolicy,
  MAX_DECLARED_BODY_BYTES,
  refuseCrossSiteWrite,
  securityHeaders,
} from "@/lib/http/request-guard";

const req = (method: string, pathname: string, headers: Record<string, string>) => ({
  method,
  pathname,
  headers: new Headers({ host: "127.0.0.1:3000", ...headers }),
});

describe("cross-site writes", () => {
  it("lets the app's own pages write: same Origin, or Sec-Fetch-Site same-origin", () => {
    expect(
      refuseCrossSiteWrite(
        req("PATCH", "/api/productions/1/fixtures/2", {
          origin: "http://127.0.0.1:3000",
          "content-type": "application/json",
          "content-length": "20",
        }),
      ),
    ).toBeNull();
    expect(
      refuseCrossSiteWrite(
        req("POST", "/productions/1/settings", {
          "sec-fetch-site": "same-origin",
          "content-type": "multipart/form-data; boundary=x",
          "content-length": "20",
        }),
      ),
    ).toBeNull();
  });

  it("refuses a write from another site or another port of the same host (Fetch Metadata: same-site is not same-origin)", () => {
    // A form on another port of the same machine is "same-site" to the browser, but not the same origin.
    expect(
      refuseCrossSiteWrite(
        req("POST", "/api/productions", {
          origin: "http://127.0.0.1:4000",
          "content-type": "application/json",
          "content-length": "2",
        }),
      )?.status,
    ).toBe(403);
    expect(
      refuseCrossSiteWrite(
        req("POST", "/api/productions", {
          "sec-fetch-site": "same-site",
          "content-type": "application/json",
          "content-length": "2",
        }),
      )?.status,
    ).toBe(403);
    expect(
      refuseCrossSiteWrite(req("DELETE", "/api/productions/1/positions/3", { "sec-fetch-site": "cross-site" }))?.status,
    ).toBe(403);
    // A sandboxed frame or a data: page sends Origin: null.
    expect(refuseCrossSiteWrite(req("POST", "/api/auth/sign-out", { origin: "null" }))?.status).toBe(403);
    // A server action posted from another site: 403, not a 500 with a digest.
    expect(
      refuseCrossSiteWrite(req("POST", "/productions/1/settings", { origin: "http://evil.test", "next-action": "abc" }))
        ?.status,
    ).toBe(403);
  });

  it("refuses body types a plain HTML form can send to a route handler, and names the type", () => {
    const r = refuseCrossSiteWrite(
      req("POST", "/api/auth/sign-in", { "content-type": "text/plain", "content-length": "40" }),
    );
    expect(r?.status).toBe(415);
    expect(r?.message).toContain("text/plain");
    expect(
      refuseCrossSiteWrite(
        req("POST", "/api/auth/sign-in", {
          "content-type": "application/x-www-form-urlencoded",
          "content-length": "40",
        }),
      )?.status,
    ).toBe(415);
    // No body at all (sign-out) needs no type.
    expect(refuseCrossSiteWrite(req("POST", "/api/auth/sign-out", {}))).toBeNull();
    // Reads are never refused.
    expect(refuseCrossSiteWrite(req("GET", "/api/productions", { origin: "http://evil.test" }))).toBeNull();
  });

  it("refuses a body whose declared length is over the cap before it is read", () => {
    const r = refuseCrossSiteWrite(
      req("POST", "/api/auth/sign-in", {
        "content-type": "application/json",
        "content-length": String(MAX_DECLARED_BODY_BYTES + 1),
      }),
    );
    expect(r?.status).toBe(413);
  });
});

describe("security headers", () => {
  it("allows scripts only with the nonce, and no framing", () => {
    const csp = contentSecurityPolicy("abc123");
    expect(csp).toContain("script-src 'self' 'nonce-abc123' 'strict-dynamic'");
    expect(csp).not.toContain("unsafe-eval");
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).toContain("object-src 'none'");
    expect(contentSecurityPolicy("n", { dev: true })).toContain("'unsafe-eval'");
  });

  it("sends HSTS only over HTTPS", () => {
    expect(securityHeaders(false)["Strict-Transport-Security"]).toBeUndefined();
    expect(securityHeaders(true)["Strict-Transport-Security"]).toMatch(/max-age=\d+/);
    expect(securityHeaders(false)["X-Content-Type-Options"]).toBe("nosniff");
  });
});
