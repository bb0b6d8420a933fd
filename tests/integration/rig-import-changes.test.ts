// The change log an import leaves behind, read straight from MariaDB: one record per fixture, so a
// fixture's history can be looked up by its id, holding what the file wrote (and, for updates, what was there).
import * as mariadb from "mariadb";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { fixturesOf, rigProduction, upload } from "./support/rig";

let db: mariadb.Connection;

beforeAll(async () => {
  const u = new URL(process.env.DATABASE_URL!);
  db = await mariadb.createConnection({
    host: u.hostname,
    port: Number(u.port),
    user: decodeURIComponent(u.username),
    password: decodeURIComponent(u.password),
    database: u.pathname.slice(1),
  });
});
afterAll(() => db?.end());

type Entry = {
  entity: string;
  entity_id: number;
  action: string;
  before: Record<string, unknown> | null;
  after: Record<string, unknown> | null;
  user_id: number;
};
const asJson = (v: unknown) => (typeof v === "string" ? JSON.parse(v) : v);

async function fixtureChanges(productionId: number): Promise<Entry[]> {
  const rows = await db.query(
    "SELECT entity, entity_id, action, `before`, `after`, user_id FROM change_entries WHERE production_id = ? AND entity = 'fixture' ORDER BY id",
    [productionId],
  );
  return rows.map((r: Entry) => ({ ...r, before: asJson(r.before), after: asJson(r.after) }));
}

describe("an import's change records", () => {
  it("records each created fixture with the fields the file set, then each update with before and after", async () => {
    const { s, id } = await rigProduction();
    const first = "Position,Unit,Type,Channel,Colour\nLX1,1,Profile 26,11,pale blue\nLX1,2,Profile 26,12,pale amber\n";
    expect((await upload(s, id, { name: "rig.csv", body: first }, { mode: "commit" })).status).toBe(200);
    const made = await fixturesOf(s, id);
    const created = await fixtureChanges(id);
    expect(created).toHaveLength(2);
    for (const f of made) {
      const entry = created.find((e) => e.entity_id === f.id)!;
      expect(entry.action).toBe("create");
      expect(entry.before).toBeNull();
      expect(entry.after).toMatchObject({
        id: f.id,
        unitNumber: f.unitNumber,
        channel: f.channel,
        colour: f.colour,
        version: 1,
      });
      expect(entry.after).not.toHaveProperty("notes"); // left empty by the file, so not written into the record
    }

    // Only unit 2's colour changes: one update record, nothing for the unchanged unit 1.
    const second = "Position,Unit,Type,Channel,Colour\nLX1,1,Profile 26,11,pale blue\nLX1,2,Profile 26,12,deep blue\n";
    const again = await upload(s, id, { name: "rig.csv", body: second }, { mode: "commit" });
    expect(again.json.result.counts).toMatchObject({ create: 0, update: 1 });
    const unit2 = made.find((f) => f.unitNumber === "2");
    const updates = (await fixtureChanges(id)).filter((e) => e.action === "update");
    expect(updates).toHaveLength(1);
    expect(updates[0]).toMatchObject({
      entity_id: unit2.id,
      before: { colour: "pale amber" },
      after: { id: unit2.id, colour: "deep blue", version: unit2.version + 1 },
    });
    expect(updates[0].after).not.toHaveProperty("channel");
  });
});
