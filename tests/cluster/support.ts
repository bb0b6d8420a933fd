// What the cluster suite needs: an HTTP client per app server (one cookie jar that can move between
// them), direct queries on a node, and stopping and starting nodes (scripts/lib/galera.mjs).
import { readFileSync } from "node:fs";
import path from "node:path";
import * as mariadb from "mariadb";
// @ts-expect-error: a plain ES module of the test scripts, without types
import { startNode } from "../../scripts/lib/galera.mjs";

export type GaleraNode = {
  name: string;
  dir: string;
  port: number;
  gcommPort: number;
  istPort: number;
  sstPort: number;
};
type Cluster = {
  nodes: GaleraNode[];
  peers: string[];
  credentials: { user: string; password: string; database: string };
};

export const APP_A = process.env.APP_URL_A ?? "";
export const APP_B = process.env.APP_URL_B ?? "";
export const CLUSTER: Cluster = JSON.parse(process.env.TEST_GALERA_CLUSTER ?? '{"nodes":[],"peers":[]}');

/** A signed-in session whose cookie can be sent to either app server. */
export class Session {
  cookie = "";

  async request(base: string, method: string, url: string, body?: unknown) {
    const res = await fetch(base + url, {
      method,
      redirect: "manual",
      headers: {
        ...(this.cookie ? { cookie: this.cookie } : {}),
        ...(body !== undefined ? { "content-type": "application/json" } : {}),
      },
      body: body !== undefined ? JSON.stringify(body) : undefined,
    });
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(";");
      this.cookie = pair.endsWith("=") ? "" : pair;
    }
    const text = await res.text();
    let json: any = null;
    try {
      json = text ? JSON.parse(text) : null;
    } catch {
      json = { raw: text };
    }
    return { status: res.status, json };
  }
}

/** One query on a node as the app user, on a connection of its own. */
export async function queryNode<T = any>(node: GaleraNode, sql: string, values: unknown[] = []): Promise<T[]> {
  const conn = await mariadb.createConnection({
    host: "127.0.0.1",
    port: node.port,
    ...CLUSTER.credentials,
    connectTimeout: 5_000,
  });
  try {
    return (await conn.query(sql, values)) as T[];
  } finally {
    await conn.end();
  }
}

/** A Galera status variable of a node (SHOW STATUS LIKE …), as text. */
export async function galeraStatus(node: GaleraNode, name: string): Promise<string> {
  const rows = await queryNode<{ Value: string }>(node, "SHOW GLOBAL STATUS LIKE ?", [name]);
  return rows[0]?.Value ?? "";
}

/** The pid of the node's server process, from its pid file (it changes when a node is started again). */
export function nodePid(node: GaleraNode): number {
  return Number(readFileSync(path.join(node.dir, "mariadb.pid"), "utf8").trim());
}

/** Kills a node's server outright (SIGKILL: a crash, not a clean shutdown). */
export function killNode(node: GaleraNode) {
  process.kill(nodePid(node), "SIGKILL");
}

/** Starts a stopped node again; it rejoins the cluster and receives what it missed. */
export async function restartNode(node: GaleraNode) {
  await startNode({ ...node }, CLUSTER.peers, { credentials: CLUSTER.credentials });
}
