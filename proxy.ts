// Runs before every page and server action: refuses cross-site writes and oversized bodies, and gives every
// page its security headers with a fresh script nonce. The rules live in lib/http/request-guard.ts.
// The API is left out: running a proxy costs every request about a millisecond of CPU and makes Next buffer
// its body, so API answers get their fixed headers from next.config.ts and their refusals from `route`.
import { type NextRequest, NextResponse } from "next/server";
import { contentSecurityPolicy, refuseCrossSiteWrite, securityHeaders } from "@/lib/http/request-guard";

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
  // Static files need no nonce; the API is served without the proxy (see above).
  matcher: [{ source: "/((?!_next/static|_next/image|favicon.ico|icons/|manifest.webmanifest|api/).*)" }],
};
