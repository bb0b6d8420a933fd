// Throwline on a three-node MariaDB Galera cluster (scripts/test-cluster.mjs): app server A prefers node 1,
// app server B node 2, each failing over to the other nodes. What a deployment past one machine needs:
// a session and a write made on one are seen on the other at once; two edits of one row through two
// nodes end as one save and one 409 (a certification conflict is a conflict, not a 500); and a node
// killed mid-load costs a few 503s, never an acknowledged write.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_PASSWORD, DEMO_USERS } from "../support/demo";
import { APP_A, APP_B, CLUSTER, Session, galeraStatus, killNode, queryNode, restartNode } from "./support";

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));
const session = new Session();
let productionId = 0;

const landmark = (name: string) => ({ name, x1: -1, y1: 0, x2: 1, y2: 0 });
const landmarksOf = async (base: string) =>
  (await session.request(base, "GET", `/api/productions/${productionId}/landmarks`)).json.landmarks as Array<{
    id: number;
    name: string;
    version: number;
  }>;

beforeAll(async () => {
  expect(CLUSTER.nodes).toHaveLength(3);
  for (const n of CLUSTER.nodes) expect(await galeraStatus(n, "wsrep_cluster_size")).toBe("3");
  const signIn = await session.request(APP_A, "POST", "/api/auth/sign-in", {
    email: DEMO_USERS.designer,
    password: DEMO_PASSWORD,
  });
  expect(signIn.status).toBe(200);
  const created = await session.request(APP_A, "POST", "/api/productions", {
    name: "Cluster run",
    venue: "Loopback hall",
    displayUnits: "metric",
  });
  expect(created.status).toBe(201);
  productionId = created.json.production.id;
});

afterAll(async () => {
  // A node left stopped by a failed test would make the integration runs that follow fail for the wrong reason.
  for (const n of CLUSTER.nodes) {
    try {
      await galeraStatus(n, "wsrep_cluster_size");
    } catch {
      await restartNode(n);
    }
  }
});

describe("two app servers on two nodes", () => {
  it("a session and a write made through A (node 1) are seen through B (node 2) at once", async () => {
    const made = await session.request(
      APP_A,
      "POST",
      `/api/productions/${productionId}/landmarks`,
      landmark("DS edge"),
    );
    expect(made.status).toBe(201);
    // No wait: the servers read with wsrep_sync_wait = 1, so node 2 answers only after applying node 1's write.
    const seen = await landmarksOf(APP_B);
    expect(seen.find((l) => l.id === made.json.landmark.id)?.name).toBe("DS edge");
    const onNode2 = await queryNode(CLUSTER.nodes[1], "SELECT name FROM landmarks WHERE id = ?", [
      made.json.landmark.id,
    ]);
    expect(onNode2[0]?.name).toBe("DS edge");
  });

  it("the same row edited through both nodes at once: one save and one 409 with the current row, never a 500", async () => {
    const made = await session.request(
      APP_A,
      "POST",
      `/api/productions/${productionId}/landmarks`,
      landmark("Contest"),
    );
    const id = made.json.landmark.id as number;
    const conflictsBefore = await certificationConflicts();
    for (let round = 1; round <= 12; round++) {
      const { version } = (await landmarksOf(APP_A)).find((l) => l.id === id)!;
      const edits = [
        [APP_A, `through A ${round}`],
        [APP_B, `through B ${round}`],
      ] as const;
      const answers = await Promise.all(
        edits.map(([base, name]) =>
          session.request(base, "PATCH", `/api/productions/${productionId}/landmarks/${id}`, { name, version }),
        ),
      );
      expect(answers.map((a) => a.status).sort()).toEqual([200, 409]);
      const won = answers.findIndex((a) => a.status === 200);
      const lost = answers[1 - won];
      // The 409 carries the row as it now stands: the winner's edit.
      expect(JSON.stringify(lost.json)).toContain(edits[won][1]);
      for (const base of [APP_A, APP_B]) {
        expect((await landmarksOf(base)).find((l) => l.id === id)?.name).toBe(edits[won][1]);
      }
    }
    // How many of those collisions Galera itself caught at commit (the rest the version check caught first).
    console.log(
      `Galera certification conflicts during the contest: ${(await certificationConflicts()) - conflictsBefore}`,
    );
  });
});

async function certificationConflicts() {
  let total = 0;
  for (const n of CLUSTER.nodes) {
    total += Number(await galeraStatus(n, "wsrep_local_cert_failures"));
    total += Number(await galeraStatus(n, "wsrep_local_bf_aborts"));
  }
  return total;
}

describe("a node killed mid-load", () => {
  it("B fails over to another node without a restart, and no acknowledged write is lost", async () => {
    const node2 = CLUSTER.nodes[1];
    const acknowledged: Array<{ id: number; name: string; via: string; at: number }> = [];
    const statuses = new Map<number, number>();
    let killedAt = Number.POSITIVE_INFINITY;
    const stopAt = Date.now() + 20_000;
    const writer = async (base: string, label: string) => {
      for (let i = 0; Date.now() < stopAt; i++) {
        const name = `${label}-${i}`;
        const r = await session.request(base, "POST", `/api/productions/${productionId}/landmarks`, landmark(name));
        statuses.set(r.status, (statuses.get(r.status) ?? 0) + 1);
        if (r.status === 201) acknowledged.push({ id: r.json.landmark.id, name, via: label, at: Date.now() });
        else await sleep(100);
      }
    };
    const writers = Promise.all([writer(APP_A, "A1"), writer(APP_A, "A2"), writer(APP_B, "B1"), writer(APP_B, "B2")]);
    await sleep(4_000);
    killNode(node2);
    killedAt = Date.now();
    await expect(queryNode(node2, "SELECT 1")).rejects.toThrow();
    await writers;

    console.log(`Answers during the load: ${JSON.stringify(Object.fromEntries(statuses))}`);
    // Only saves and "database not reachable, try again" (503): nothing else, no 500.
    expect([...statuses.keys()].every((s) => s === 201 || s === 503)).toBe(true);
    expect(acknowledged.some((w) => w.via.startsWith("B") && w.at < killedAt)).toBe(true);
    // B went on saving after its node died, through another node, without being restarted.
    expect(acknowledged.filter((w) => w.via.startsWith("B") && w.at > killedAt + 1_000).length).toBeGreaterThan(0);

    const expectAll = (rows: Array<{ id: number; name: string }>) => {
      const byId = new Map(rows.map((r) => [r.id, r.name]));
      const missing = acknowledged.filter((w) => byId.get(w.id) !== w.name);
      expect(missing).toEqual([]);
    };
    expectAll(await landmarksOf(APP_A));
    expectAll(await landmarksOf(APP_B));

    // Node 2 comes back, catches up with what it missed, and has every acknowledged write too.
    await restartNode(node2);
    for (let t = 0; (await galeraStatus(node2, "wsrep_local_state_comment")) !== "Synced" && t < 120; t++)
      await sleep(500);
    expect(await galeraStatus(node2, "wsrep_cluster_size")).toBe("3");
    expectAll(await queryNode(node2, "SELECT id, name FROM landmarks WHERE production_id = ?", [productionId]));
  });
});
