import net from "node:net";

// Failing over between database servers (the nodes of a MariaDB Galera cluster, which all take writes).
// DATABASE_URL names the preferred server; DATABASE_FAILOVER_HOSTS lists the others ("host:port,
// host:port"). Every new pooled connection goes to the first server, in that order starting from the
// one last used, that accepts a TCP connection; a request that was using a lost connection fails with
// 503 and the next one reaches a live server, without restarting the app.

export type DatabaseHost = { host: string; port: number };

/** "db1:3306, db2" → hosts (port 3306 when left out); throws naming the entry that is not host[:port]. */
export function parseHostList(text: string): DatabaseHost[] {
  return text
    .split(",")
    .map((entry) => entry.trim())
    .filter(Boolean)
    .map((entry) => {
      const m = /^([A-Za-z0-9.-]+|\[[0-9A-Fa-f:]+\])(?::(\d{1,5}))?$/.exec(entry);
      const port = m?.[2] === undefined ? 3306 : Number(m[2]);
      if (!m || port < 1 || port > 65535)
        throw new Error(`DATABASE_FAILOVER_HOSTS: "${entry}" is not a host or host:port (port 1–65535)`);
      return { host: m[1].replace(/^\[|\]$/g, ""), port };
    });
}

/** Whether something accepts a TCP connection on `host:port` within `timeoutMs`. */
export function acceptsConnections({ host, port }: DatabaseHost, timeoutMs = 1_000): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = net.connect({ host, port });
    const done = (ok: boolean) => {
      socket.destroy();
      resolve(ok);
    };
    socket.setTimeout(timeoutMs, () => done(false));
    socket.once("connect", () => done(true));
    socket.once("error", () => done(false));
  });
}

/**
 * A function giving the host for the next new connection: the one last used while it answers, else the
 * next that does, in list order. When none answers it gives the last used (the connection then fails
 * and the request gets a 503).
 */
export function hostChooser(
  hosts: DatabaseHost[],
  answers: (h: DatabaseHost) => Promise<boolean> = acceptsConnections,
): () => Promise<DatabaseHost> {
  if (!hosts.length) throw new Error("hostChooser needs at least one host");
  let current = 0;
  return async () => {
    for (let step = 0; step < hosts.length; step++) {
      const k = (current + step) % hosts.length;
      if (await answers(hosts[k])) {
        current = k;
        return hosts[k];
      }
    }
    return hosts[current];
  };
}
