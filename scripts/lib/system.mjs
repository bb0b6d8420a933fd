// System packages the two commands need, installed with apt-get when missing.
// Only Node built-ins here: this runs before `npm install`.
import { execFileSync, spawnSync } from "node:child_process";
import { existsSync } from "node:fs";

/** Each entry: a file that proves the package is present, and the Debian package that provides it. */
export const PACKAGES = {
  mariadb: { probe: "/usr/sbin/mariadbd", pkg: "mariadb-server" },
  mariadbClient: { probe: "/usr/bin/mariadb", pkg: "mariadb-client" },
  chromium: { probe: "/usr/bin/chromium", pkg: "chromium" },
  pdftoppm: { probe: "/usr/bin/pdftoppm", pkg: "poppler-utils" },
  libreoffice: { probe: "/usr/bin/libreoffice", pkg: "libreoffice-calc" },
  fonts: { probe: "/usr/share/fonts/truetype/dejavu/DejaVuSans.ttf", pkg: "fonts-dejavu-core" },
  // `npm run test:cluster` only: Galera replication and what its rsync state transfer calls.
  galera: { probe: "/usr/lib/libgalera_smm.so", pkg: "galera-4" },
  rsync: { probe: "/usr/bin/rsync", pkg: "rsync" },
  socketStats: { probe: "/usr/bin/ss", pkg: "iproute2" },
};

export function log(message) {
  process.stdout.write(`[throwline] ${message}\n`);
}

/** Installs the missing packages; when not root, prints the command to run and exits. */
export function ensurePackages(names) {
  const missing = names.map((n) => PACKAGES[n]).filter((p) => !existsSync(p.probe));
  if (missing.length === 0) return;
  const pkgs = [...new Set(missing.map((p) => p.pkg))];
  if (process.getuid && process.getuid() !== 0) {
    log(`These system packages are missing: ${pkgs.join(" ")}`);
    log(
      `Install them as root, then run this again:\n  sudo apt-get update && sudo apt-get install -y ${pkgs.join(" ")}`,
    );
    process.exit(1);
  }
  log(`Installing system packages: ${pkgs.join(" ")} (apt-get) …`);
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  run("apt-get", ["update", "-qq"], { env });
  run("apt-get", ["install", "-y", "-qq", "--no-install-recommends", ...pkgs], { env });
  for (const p of missing) {
    if (!existsSync(p.probe)) throw new Error(`apt-get finished but ${p.probe} (${p.pkg}) is still missing`);
  }
}

export function run(cmd, args, options = {}) {
  const result = spawnSync(cmd, args, { stdio: "inherit", ...options });
  if (result.status !== 0) {
    throw new Error(`${cmd} ${args.join(" ")} exited with ${result.status ?? result.signal}`);
  }
}

export function commandOutput(cmd, args, options = {}) {
  return execFileSync(cmd, args, { encoding: "utf8", ...options });
}
