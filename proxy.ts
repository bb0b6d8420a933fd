// Runs before every page and route handler: refuses cross-site writes and oversized bodies, and gives every
// response its security headers (a fresh script nonce per page). The rules live in lib/http/request-guard.ts.
import { type NextRequest, NextResponse } from "next/server";
import {
  API_CONTENT_SECURITY_POLICY,
  contentSecurityPolicy,
  refuseCrossSiteWrite,
  securityHeaders,
} from "@/lib/http/request-guard";

export function proxy(request: NextRequest) {
  const https =
    request.nextUrl.protocol === "https:" || request.headers.get("x-forwarded-proto")?.startsWith("https") === true;
  const refusal = refuseCrossSiteWrite(
    { method: request.method, pathname: request.nextUrl.pathname, headers: request.headers },
    https ? "https" : "http",
  );
  if (refusal) {
    const res = NextResponse.json({ error: refusal.code, message: refusal.message }, { status: refusal.status });
    for (const [k, v] of Object.entries(securityHeaders(https))) res.headers.set(k, v);
    return res;
  }
  if (request.nextUrl.pathname.startsWith("/api/")) {
    // JSON and files run no script: the strictest policy, and no nonce to hand down to a page (every
    // read pays for this proxy, and passing changed request headers on is its costliest part).
    const res = NextResponse.next();
    res.headers.set("Content-Security-Policy", API_CONTENT_SECURITY_POLICY);
    for (const [k, v] of Object.entries(securityHeaders(https))) res.headers.set(k, v);
    return res;
  }
  const nonce = Buffer.from(crypto.randomUUID()).toString("base64");
  const csp = contentSecurityPolicy(nonce, { dev: process.env.NODE_ENV !== "production" });
  // Next reads the nonce from the request's policy for its own scripts; the layout reads x-nonce.
  const requestHeaders = new Headers(request.headers);
  requestHeaders.set("x-nonce", nonce);
  requestHeaders.set("Content-Security-Policy", csp);
  const res = NextResponse.next({ request: { headers: requestHeaders } });
  res.headers.set("Content-Security-Policy", csp);
  for (const [k, v] of Object.entries(securityHeaders(https))) res.headers.set(k, v);
  return res;
}

export const config = {
  // Static files need no nonce. The three upload routes are left out because Next buffers (and past 10 MB
  // cuts short) the body of any request a proxy sees, which would defeat their own streaming size caps; they
  // apply the same cross-site rule themselves (lib/http/upload-form.ts).
  matcher: [
    {
      source:
        "/((?!_next/static|_next/image|favicon.ico|icons/|manifest.webmanifest|api/productions/[^/]+/uploads$|api/productions/[^/]+/import$|api/productions/[^/]+/fixtures/[^/]+/photo$).*)",
    },
  ],
};
