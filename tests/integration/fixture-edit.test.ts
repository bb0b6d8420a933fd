// One fixture's edit runs as plain driver statements in one transaction (lib/data/fixtures.ts
// updateFixture): the row after the edit is worked out in JavaScript rather than read again. These tests
// hold that worked-out row to what MariaDB really stored, and check that every refusal writes nothing.
import type { Connection } from "mariadb";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { rigProduction } from "./support/rig";
import { openTestDb } from "./concurrency-support";

type Row = Record<string, unknown> & { id: number; version: number };

// The fields of the stored record: what the change log holds, without the joined names and the pools.
const JOINED = new Set(["positionName", "typeName", "family", "focusPointName", "computed"]);
const record = (f: Row) => Object.fromEntries(Object.entries(f).filter(([k]) => !JOINED.has(k)));

let db: Connection;
beforeAll(async () => {
  db = await openTestDb();
});
afterAll(async () => {
  await db?.end();
});

/** A fresh production (support/rig.ts) with a focus point and two 13-slot units on its pipe. */
async function rig() {
  const { s, id, lx1: pipe, wash: type } = await rigProduction();
  const api = `/api/productions/${id}`;
  const point = (await s.post(`${api}/focus-points`, { name: "Down left", x: -2, y: -1 })).json.focusPoint;
  const created = await s.post(`${api}/fixtures`, {
    fixtures: [
      { positionId: pipe.id, fixtureTypeId: type.id, unitNumber: "1", x: -1, y: 1, universe: 1, address: 1 },
      { positionId: pipe.id, fixtureTypeId: type.id, unitNumber: "2", x: 1, y: 1, universe: 1, address: 14 },
    ],
  });
  expect(created.status).toBe(201);
  const [one, two] = created.json.fixtures as Row[];
  return { s, id, api, pipe, type, point, one, two };
}

const changeCount = async (productionId: number, fixtureId: number) =>
  Number(
    (
      await db.query("SELECT COUNT(*) AS n FROM change_entries WHERE production_id = ? AND entity_id = ?", [
        productionId,
        fixtureId,
      ])
    )[0].n,
  );

const lastChange = async (productionId: number, fixtureId: number) => {
  const [row] = await db.query(
    "SELECT `before`, `after`, user_id FROM change_entries WHERE production_id = ? AND entity = 'fixture' AND entity_id = ? ORDER BY id DESC LIMIT 1",
    [productionId, fixtureId],
  );
  const parse = (v: unknown) => (typeof v === "string" ? JSON.parse(v) : v);
  return { before: parse(row.before), after: parse(row.after), userId: row.user_id as number };
};

describe("one fixture's edit", () => {
  it("logs before and after exactly as stored, JSON, flags and the focus stamp included", async () => {
    const { s, id, api, point, one, two } = await rig();
    const sortKeys = async () =>
      (await db.query("SELECT unit_sort FROM fixtures WHERE id IN (?, ?) ORDER BY id", [one.id, two.id])).map(
        (r: { unit_sort: string }) => r.unit_sort,
      ) as string[];
    const [keyBefore] = await sortKeys();
    const seen = (await s.get(`${api}/fixtures/${one.id}`)).json.fixture as Row;
    const cuts = [{ label: "top", a: { x: -3, y: 0.5 }, b: { x: 3, y: 0.2 } }];
    const res = await s.patch(`${api}/fixtures/${one.id}`, {
      version: seen.version,
      notes: "edge of the apron",
      colour: "pale straw",
      shutterCuts: cuts,
      focusPointId: point.id,
      focused: true,
      unitNumber: "1A",
    });
    expect(res.status).toBe(200);
    const answered = res.json.fixture as Row;
    expect(answered.version).toBe(seen.version + 1);
    expect(answered.focusPointName).toBe("Down left");
    expect(answered.shutterCuts).toEqual(cuts);
    expect(answered.focusedAt).toEqual(expect.any(String));

    const stored = (await s.get(`${api}/fixtures/${one.id}`)).json.fixture as Row;
    const logged = await lastChange(id, one.id);
    // The worked-out "after" is field for field what a fresh read returns (dates to the second).
    expect(logged.after).toEqual(record(stored));
    expect(logged.before).toEqual(record(seen));
    const [raw] = await db.query("SELECT focused_by, version FROM fixtures WHERE id = ?", [one.id]);
    expect(raw.version).toBe(seen.version + 1);
    expect(raw.focused_by).toBe(logged.userId);
    // The hidden sort key follows the new unit number: 1A after 1, still before 2.
    const [keyOne, keyTwo] = await sortKeys();
    expect(keyOne > keyBefore && keyOne < keyTwo).toBe(true);

    // Clearing the focus mark clears who and when, in the row and in the log.
    const cleared = await s.patch(`${api}/fixtures/${one.id}`, { version: stored.version, focused: false });
    expect(cleared.status).toBe(200);
    expect(cleared.json.fixture).toMatchObject({ focused: false, focusedAt: null, focusedBy: null });
    expect((await lastChange(id, one.id)).after).toEqual(record(cleared.json.fixture));
  });

  it("answers a stale version with 409 and the current row, and writes nothing", async () => {
    const { s, id, api, one } = await rig();
    const first = await s.patch(`${api}/fixtures/${one.id}`, { version: one.version, notes: "first" });
    expect(first.status).toBe(200);
    const before = await changeCount(id, one.id);
    const late = await s.patch(`${api}/fixtures/${one.id}`, { version: one.version, notes: "second" });
    expect(late.status).toBe(409);
    expect(late.json.error.current).toEqual(record(first.json.fixture));
    expect(await changeCount(id, one.id)).toBe(before);
  });

  it("refuses a taken unit number, a foreign reference and a DMX range past 512 by field, writing nothing", async () => {
    const { s, id, api, one, two } = await rig();
    const other = await rig();
    const before = await changeCount(id, two.id);
    const cases: Array<[Record<string, unknown>, string]> = [
      [{ unitNumber: one.unitNumber }, "unitNumber"],
      [{ positionId: other.pipe.id }, "positionId"],
      [{ fixtureTypeId: other.type.id }, "fixtureTypeId"],
      [{ focusPointId: other.point.id }, "focusPointId"],
      // ANSI E1.11: a 13-slot unit at 501 would need slots 501–513.
      [{ address: 501 }, "address"],
    ];
    for (const [change, field] of cases) {
      const res = await s.patch(`${api}/fixtures/${two.id}`, { version: two.version, ...change });
      expect(res.status, field).toBe(400);
      expect(Object.keys(res.json.error.fieldErrors), field).toEqual([field]);
    }
    const now = (await s.get(`${api}/fixtures/${two.id}`)).json.fixture as Row;
    expect(now.version).toBe(two.version);
    expect(await changeCount(id, two.id)).toBe(before);
    // The last start that fits is allowed: 500–512.
    expect((await s.patch(`${api}/fixtures/${two.id}`, { version: two.version, address: 500 })).status).toBe(200);
  });

  it("answers 404 for a fixture of another production, and leaves it alone", async () => {
    const { s, api } = await rig();
    const other = await rig();
    const res = await s.patch(`${api}/fixtures/${other.one.id}`, { version: other.one.version, notes: "not mine" });
    expect(res.status).toBe(404);
    const theirs = (await other.s.get(`${other.api}/fixtures/${other.one.id}`)).json.fixture as Row;
    expect(theirs.version).toBe(other.one.version);
  });
});
