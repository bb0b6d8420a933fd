/** @type {import('next').NextConfig} */
const nextConfig = {
  // Sequelize and the mariadb driver stay out of the bundle: bundling them fails on optional
  // dialect modules (pg-hstore) and would open pools at build time.
  serverExternalPackages: ["sequelize", "mariadb"],
  // The test runner builds into its own folder so a running dev server is never disturbed.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
  // Types are checked once for the whole tree (app, lib, tests, bench) by `npm test`'s own
  // typecheck step (scripts/test.mjs), so the build does not check them a second time.
  typescript: { ignoreBuildErrors: true },
};
export default nextConfig;
