// Rules every request meets before any page or route handler runs: the security headers, and the refusal
// of cross-site writes. Pages (and their server actions) meet them in proxy.ts; the API, which the proxy
// leaves alone because every read paid for it, gets its headers from next.config.ts and its refusals from
// lib/http/respond.ts `route`. Pure functions of the request's method, path and headers, so they are
// unit-tested without a server.

/** Methods that change state; GET and HEAD never do in this app. */
const WRITES = new Set(["POST", "PUT", "PATCH", "DELETE"]);
/** JSON for route handlers; multipart for the upload routes. Both are what the app's own pages send. */
const API_BODY_TYPES = ["application/json", "multipart/form-data"];
/** The largest body the proxy lets through by its declared length; each upload route caps its own lower. */
export const MAX_DECLARED_BODY_BYTES = 64 * 1024 * 1024;

export type GuardInput = {
  method: string;
  pathname: string;
  headers: { get(name: string): string | null };
};
export type Refusal = { status: 403 | 413 | 415; code: string; message: string };

/** The origin this request was addressed to, as a browser on the same site would send it in `Origin`. */
function ownOrigin(h: GuardInput["headers"], fallbackProtocol: string): string | null {
  const host = h.get("x-forwarded-host") ?? h.get("host");
  if (!host) return null;
  const proto = h.get("x-forwarded-proto")?.split(",")[0].trim() ?? fallbackProtocol;
  return `${proto}://${host}`;
}

/**
 * Refuses a write that a page on another site could have sent. Browsers send `Origin` on every
 * cross-origin POST and `Sec-Fetch-Site` on every request (Fetch Metadata); a foreign value in either is
 * refused. A client that sends neither is not a browser page, and a cross-site request cannot come from it.
 * Route handlers also refuse the body types a plain HTML form can send (text/plain, urlencoded).
 */
export function refuseCrossSiteWrite(req: GuardInput, protocol = "http"): Refusal | null {
  if (!WRITES.has(req.method.toUpperCase())) return null;
  const h = req.headers;
  const origin = h.get("origin");
  const site = h.get("sec-fetch-site");
  const own = ownOrigin(h, protocol);
  const foreignOrigin = origin !== null && (origin === "null" || origin !== own);
  const foreignSite = site !== null && site !== "same-origin" && site !== "none";
  if (foreignOrigin || foreignSite) {
    return {
      status: 403,
      code: "forbidden",
      message: "This change was sent from another site, so it was refused. Make it from Throwline's own pages.",
    };
  }
  const declared = Number(h.get("content-length") ?? "0");
  if (declared > MAX_DECLARED_BODY_BYTES) {
    return {
      status: 413,
      code: "too_large",
      message: `The request is ${Math.round(declared / 1048576)} MB; at most ${MAX_DECLARED_BODY_BYTES / 1048576} MB is accepted.`,
    };
  }
  if (req.pathname.startsWith("/api/")) {
    const hasBody = declared > 0 || h.get("transfer-encoding") !== null;
    const type = (h.get("content-type") ?? "").split(";")[0].trim().toLowerCase();
    if (hasBody && !API_BODY_TYPES.includes(type)) {
      return {
        status: 415,
        code: "unsupported_media_type",
        message: `The request body must be JSON (Content-Type: application/json)${type ? `, not ${type}` : ""}.`,
      };
    }
  }
  return null;
}

/**
 * The Content-Security-Policy for a page. Scripts run only with this request's nonce (Next adds it to its
 * own scripts when it finds it in the request's policy); 'strict-dynamic' lets those load the app's chunks.
 * Styles allow inline: React style attributes and Konva need them, and they cannot run code.
 */
export function contentSecurityPolicy(nonce: string, { dev = false } = {}): string {
  return [
    "default-src 'self'",
    // React's development build evaluates source maps with eval; production never does.
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' blob: data:",
    "font-src 'self'",
    "connect-src 'self'",
    "worker-src 'self' blob:",
    "manifest-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}

/** The policy of the API's answers (JSON, files): nothing in them may load or run anything, or be framed. */
export const API_CONTENT_SECURITY_POLICY = "default-src 'none'; frame-ancestors 'none'";

/** HTTP Strict Transport Security (RFC 6797): a year, subdomains included. */
export const STRICT_TRANSPORT_SECURITY = "max-age=31536000; includeSubDomains";

/** Headers every response carries. HSTS only over HTTPS: over plain HTTP a browser ignores it anyway. */
export function securityHeaders(https: boolean): Record<string, string> {
  return {
    "X-Content-Type-Options": "nosniff",
    "Referrer-Policy": "strict-origin-when-cross-origin",
    "X-Frame-Options": "DENY",
    "Permissions-Policy": "camera=(self), microphone=(), geolocation=()",
    ...(https ? { "Strict-Transport-Security": STRICT_TRANSPORT_SECURITY } : {}),
  };
}

/** The status of a refusal as the app's error code (for a route handler, which answers through AppError). */
export const REFUSAL_CODES = { 403: "forbidden", 413: "too_large", 415: "unsupported" } as const;
