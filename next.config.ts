import type { NextConfig } from "next";
import { API_CONTENT_SECURITY_POLICY, STRICT_TRANSPORT_SECURITY, securityHeaders } from "./lib/http/request-guard";

const asList = (headers: Record<string, string>) => Object.entries(headers).map(([key, value]) => ({ key, value }));

const nextConfig: NextConfig = {
  // Sequelize and the mariadb driver stay out of the bundle: bundling them fails on optional
  // dialect modules (pg-hstore) and would open pools at build time.
  serverExternalPackages: ["sequelize", "mariadb"],
  // The test runner builds into its own folder so a running dev server is never disturbed.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
  // Types are checked once for the whole tree (app, lib, tests, bench) by `npm test`'s own
  // typecheck step (scripts/test.mjs), so the build does not check them a second time.
  typescript: { ignoreBuildErrors: true },
  // The API's answers (JSON and files) carry fixed headers: proxy.ts, which gives pages theirs, leaves the
  // API alone. HSTS only when a TLS-terminating proxy in front says the request came over HTTPS.
  async headers() {
    return [
      {
        source: "/api/:path*",
        headers: asList({ "Content-Security-Policy": API_CONTENT_SECURITY_POLICY, ...securityHeaders(false) }),
      },
      {
        source: "/api/:path*",
        has: [{ type: "header", key: "x-forwarded-proto", value: "https.*" }],
        headers: asList({ "Strict-Transport-Security": STRICT_TRANSPORT_SECURITY }),
      },
    ];
  },
};

export default nextConfig;
