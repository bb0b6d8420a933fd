// Many clients at once against the real server and MariaDB: no write acknowledged and then lost, no
// 500, overlapping bulk edits queue or conflict instead of deadlocking, and creates beyond the pool
// size all land while the app keeps answering other reads.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Connection } from "mariadb";
import { POOL_MAX } from "@/models";
import type { ApiSession } from "./support/api";
import { rigProduction } from "./support/rig";
import { type ChangeRow, changesOf, openTestDb } from "./concurrency-support";

let db: Connection;
let s: ApiSession;
let pid: number;
let lx1: { id: number };
let profile: { id: number };

beforeAll(async () => {
  db = await openTestDb();
  ({ s, id: pid, lx1, profile } = await rigProduction());
});
afterAll(async () => {
  await db?.end();
});

const ALLOWED = new Set([200, 201, 409, 503]);

async function hang(units: string[]) {
  const r = await s.post(`/api/productions/${pid}/fixtures`, {
    fixtures: units.map((unitNumber, i) => ({
      positionId: lx1.id,
      fixtureTypeId: profile.id,
      unitNumber,
      x: -5 + i * 0.2,
      y: 1,
    })),
  });
  expect(r.status, JSON.stringify(r.json)).toBe(201);
  return r.json.fixtures as Array<{ id: number; version: number }>;
}

type Ack = { value: string; version: number };

/**
 * `clients` writers on one row at once: each reads, writes its own value under the version it read,
 * and on a 409 tries again from the current row the answer carries (a few times). Returns the
 * acknowledged writes and every status seen.
 */
async function contend(
  clients: number,
  write: (value: string, version: number) => Promise<{ status: number; json: any }>,
  read: () => Promise<number>,
  versionOf: (json: any) => number,
) {
  const acks: Ack[] = [];
  const statuses: number[] = [];
  await Promise.all(
    Array.from({ length: clients }, async (_, c) => {
      let version = await read();
      for (let attempt = 0; attempt < 4; attempt++) {
        const value = `client ${c} try ${attempt}`;
        const r = await write(value, version);
        statuses.push(r.status);
        if (r.status === 200) {
          acks.push({ value, version: versionOf(r.json) });
          return;
        }
        if (r.status === 409) version = versionOf({ current: r.json.error.current, conflict: true });
        else return;
      }
    }),
  );
  return { acks, statuses };
}

/**
 * Every acknowledged write is in the change log with the value and version it produced; the log's
 * versions climb one at a time (no write overwrote another unseen); the row ends as the last logged
 * write, which is the latest acknowledged one or a later write whose answer was lost.
 */
function checkHistory(acks: Ack[], logged: ChangeRow[], field: string, finalValue: unknown, finalVersion: number) {
  for (const ack of acks)
    expect(
      logged.some((c) => c.after?.[field] === ack.value && c.after?.version === ack.version),
      `${ack.value} (v${ack.version}) not logged`,
    ).toBe(true);
  const versions = logged.map((c) => c.after?.version as number);
  expect(versions).toEqual(versions.map((_, i) => versions[0] + i));
  const last = logged.at(-1)!;
  expect({ value: finalValue, version: finalVersion }).toEqual({
    value: last.after?.[field],
    version: last.after?.version,
  });
  expect(Math.max(...acks.map((a) => a.version))).toBeLessThanOrEqual(finalVersion);
}

describe("50 clients on one fixture", () => {
  it("acknowledges each version once, ends on the latest acknowledged write, and logs every one", async () => {
    const [fixture] = await hang(["1"]);
    const path = `/api/productions/${pid}/fixtures/${fixture.id}`;
    const { acks, statuses } = await contend(
      50,
      (purpose, version) => s.patch(path, { version, purpose }),
      async () => (await s.get(path)).json.fixture.version,
      (json) => (json.conflict ? json.current.version : json.fixture.version),
    );
    expect(statuses.filter((st) => !ALLOWED.has(st))).toEqual([]);
    expect(acks.length).toBeGreaterThan(0);
    // Optimistic locking: no two acknowledged writes produced the same version (none overwrote another unseen).
    expect(new Set(acks.map((a) => a.version)).size).toBe(acks.length);
    const final = (await s.get(path)).json.fixture;
    const logged = (await changesOf(db, pid, "fixture", fixture.id)).filter((c) => c.action === "update");
    checkHistory(acks, logged, "purpose", final.purpose, final.version);
  }, 180_000);
});

describe("50 clients on one cue", () => {
  it("acknowledges each version once, ends on the latest acknowledged write, and logs every one", async () => {
    const created = await s.post(`/api/productions/${pid}/cues`, { number: 7, levels: { 1: 50 } });
    expect(created.status).toBe(201);
    const cue = created.json.cue;
    const path = `/api/productions/${pid}/cues/${cue.id}`;
    const { acks, statuses } = await contend(
      50,
      (label, version) => s.patch(path, { version, label, levels: { 1: Number(label.match(/\d+/)![0]) + 1 } }),
      async () =>
        (await s.get(`/api/productions/${pid}/cues`)).json.cues.find((c: { id: number }) => c.id === cue.id).version,
      (json) => (json.conflict ? json.current.version : json.cue.version),
    );
    expect(statuses.filter((st) => !ALLOWED.has(st))).toEqual([]);
    expect(acks.length).toBeGreaterThan(0);
    expect(new Set(acks.map((a) => a.version)).size).toBe(acks.length);
    const final = (await s.get(`/api/productions/${pid}/cues`)).json.cues.find((c: { id: number }) => c.id === cue.id);
    const logged = (await changesOf(db, pid, "cue", cue.id)).filter((c) => c.action === "update");
    checkHistory(acks, logged, "label", final.label, final.version);
    // The levels went with the label in the same write.
    expect(final.levels).toEqual({ 1: Number(final.label.match(/\d+/)![0]) + 1 });
  }, 180_000);
});

describe("bulk edits over the same fixtures in opposite orders", () => {
  it("never deadlock into a 500: each applies whole or is refused whole (409 or 503)", async () => {
    const units = await hang(Array.from({ length: 16 }, (_, i) => String(101 + i)));
    const ids = units.map((u) => u.id);
    for (let round = 0; round < 3; round++) {
      const fixtures = (await s.get(`/api/productions/${pid}/fixtures`)).json.fixtures.filter((f: { id: number }) =>
        ids.includes(f.id),
      );
      const items = fixtures.map((f: { id: number; version: number }) => ({ id: f.id, version: f.version }));
      // Each edit sends the versions it read; half list the selection forwards, half backwards.
      const edits = Array.from({ length: 8 }, (_, k) => ({
        colour: `round ${round} edit ${k}`,
        items: k % 2 ? [...items].reverse() : items,
      }));
      const results = await Promise.all(
        edits.map((e) =>
          s.post(`/api/productions/${pid}/fixtures/bulk`, {
            items: e.items,
            action: { kind: "colour", colour: e.colour },
          }),
        ),
      );
      const statuses = results.map((r) => r.status);
      expect(statuses.filter((st) => !ALLOWED.has(st))).toEqual([]);
      // All read the same versions, so exactly one can apply; the rest see a changed fixture.
      expect(statuses.filter((st) => st === 200).length).toBe(1);
      const winner = edits[statuses.indexOf(200)].colour;
      const after = (await s.get(`/api/productions/${pid}/fixtures`)).json.fixtures.filter((f: { id: number }) =>
        ids.includes(f.id),
      );
      expect(after.map((f: { colour: string }) => f.colour)).toEqual(ids.map(() => winner));
    }
  }, 120_000);

  it("partly overlapping selections in opposite orders: one applies whole, the other is refused whole", async () => {
    const units = await hang(Array.from({ length: 10 }, (_, i) => String(201 + i)));
    const ids = units.map((u) => u.id);
    for (let round = 0; round < 4; round++) {
      const current = (await s.get(`/api/productions/${pid}/fixtures`)).json.fixtures.filter((f: { id: number }) =>
        ids.includes(f.id),
      );
      const item = (f: { id: number; version: number }) => ({ id: f.id, version: f.version });
      // Fixtures 0–6 forwards and 3–9 backwards: they share 3–6, and each starts on a fixture the other lacks.
      const edits = [
        { colour: `left ${round}`, items: current.slice(0, 7).map(item) },
        { colour: `right ${round}`, items: current.slice(3).map(item).reverse() },
      ];
      const results = await Promise.all(
        edits.map((e) =>
          s.post(`/api/productions/${pid}/fixtures/bulk`, {
            items: e.items,
            action: { kind: "colour", colour: e.colour },
          }),
        ),
      );
      const statuses = results.map((r) => r.status);
      expect(statuses.filter((st) => !ALLOWED.has(st))).toEqual([]);
      expect(statuses.filter((st) => st === 200).length).toBe(1);
      const winner = edits[statuses.indexOf(200)];
      const loser = edits[1 - statuses.indexOf(200)];
      const colours = new Map<number, string>(
        (await s.get(`/api/productions/${pid}/fixtures`)).json.fixtures.map((f: { id: number; colour: string }) => [
          f.id,
          f.colour,
        ]),
      );
      expect(winner.items.map((f: { id: number }) => colours.get(f.id))).toEqual(winner.items.map(() => winner.colour));
      // Nothing of the refused edit stayed, not even on the fixtures only it selected.
      expect(ids.filter((id) => colours.get(id) === loser.colour)).toEqual([]);
    }
  }, 120_000);
});

describe("creates beyond the pool size", () => {
  it(`all ${3 * POOL_MAX} parallel creates succeed, and an unrelated read during them is answered`, async () => {
    const creates = Array.from({ length: 3 * POOL_MAX }, (_, i) =>
      s.post(`/api/productions/${pid}/fixtures`, {
        fixtures: [{ positionId: lx1.id, fixtureTypeId: profile.id, unitNumber: String(301 + i), x: 0, y: 1 }],
      }),
    );
    const started = Date.now();
    const read = await s.get(`/api/productions/${pid}/positions`);
    const readMs = Date.now() - started;
    const results = await Promise.all(creates);
    expect(results.map((r) => r.status)).toEqual(results.map(() => 201));
    expect(read.status).toBe(200);
    // Not a speed goal: a read that had to wait out the pool's acquire timeout (10 s) would be a 503.
    expect(readMs).toBeLessThan(10_000);
    const made = (await s.get(`/api/productions/${pid}/fixtures`)).json.fixtures.filter(
      (f: { unitNumber: string }) => Number(f.unitNumber) > 300 && Number(f.unitNumber) <= 300 + 3 * POOL_MAX,
    );
    expect(made.length).toBe(3 * POOL_MAX);
  }, 120_000);
});
