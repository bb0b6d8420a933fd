// Starting out and ending: the starter shelf and copying types between productions (names never doubled),
// and the owner archiving, restoring and deleting a production with everything in it, files too.
import { existsSync, readdirSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { STARTER_TYPES } from "@/lib/rig/starter-types";
import { makePng } from "../support/png";
import { type ApiSession, BASE_URL, demoProductionId, demoSession, freshUser } from "./support/api";

async function newProduction(s: ApiSession, name: string) {
  const r = await s.post("/api/productions", { name, venue: "Test hall" });
  expect(r.status).toBe(201);
  return r.json.production.id as number;
}
const typeNames = async (s: ApiSession, id: number) =>
  ((await s.get(`/api/productions/${id}/fixture-types`)).json.fixtureTypes as Array<{ name: string }>)
    .map((t) => t.name)
    .sort();

describe("starter types and copies", () => {
  it("adds the whole starter shelf once; a second go adds nothing and names what it skipped", async () => {
    const { session: s } = await freshUser("starter");
    const id = await newProduction(s, "Starter test");
    expect(await typeNames(s, id)).toEqual([]);
    const first = await s.post(`/api/productions/${id}/rig/starter-types`, {});
    expect(first.status).toBe(201);
    expect(first.json.fixtureTypes).toHaveLength(STARTER_TYPES.length);
    const again = await s.post(`/api/productions/${id}/rig/starter-types`, {});
    expect(again.status).toBe(200);
    expect(again.json.fixtureTypes).toEqual([]);
    expect(again.json.skipped).toHaveLength(STARTER_TYPES.length);
    expect(await typeNames(s, id)).toEqual(STARTER_TYPES.map((t) => t.name).sort());
    // the figures arrive as written on the shelf
    const types = (await s.get(`/api/productions/${id}/fixture-types`)).json.fixtureTypes;
    const pc = types.find((t: { name: string }) => t.name === "Generic PC 150 mm");
    const shelfPc = STARTER_TYPES.find((t) => t.name === "Generic PC 150 mm")!;
    expect(pc).toMatchObject({
      coneMinDeg: shelfPc.coneMinDeg,
      coneMaxDeg: shelfPc.coneMaxDeg,
      wattage: shelfPc.wattage,
    });
  });

  it("refuses an unknown starter name and writes nothing of the batch", async () => {
    const { session: s } = await freshUser("starter-bad");
    const id = await newProduction(s, "Starter refusal");
    const r = await s.post(`/api/productions/${id}/rig/starter-types`, {
      names: [STARTER_TYPES[0].name, "Moving head 2000"],
    });
    expect(r.status).toBe(400);
    expect(r.json.error.message).toContain("Moving head 2000");
    expect(await typeNames(s, id)).toEqual([]);
  });

  it("copies chosen types from another of the designer's productions, skipping names already here", async () => {
    const { session: s } = await freshUser("copy");
    const from = await newProduction(s, "Copy source");
    const to = await newProduction(s, "Copy target");
    await s.post(`/api/productions/${from}/rig/starter-types`, {});
    await s.post(`/api/productions/${from}/fixture-types`, {
      name: "Our own cyc flood",
      family: "cyc",
      coneMinDeg: 80,
      coneMaxDeg: 80,
      peakCandela: 3000,
      dmxModes: [{ name: "dimmer", footprint: 1 }],
    });
    const sources = (await s.get(`/api/productions/${to}/rig/copy-types`)).json.sources;
    expect(sources.map((x: { productionId: number }) => x.productionId)).toEqual([from]);
    expect(sources[0].types).toHaveLength(STARTER_TYPES.length + 1);

    const two = [STARTER_TYPES[1].name, "our own CYC flood"]; // names match whatever the letter case
    const first = await s.post(`/api/productions/${to}/rig/copy-types`, { fromProductionId: from, names: two });
    expect(first.status).toBe(201);
    expect(first.json.fixtureTypes.map((t: { name: string }) => t.name).sort()).toEqual(
      [STARTER_TYPES[1].name, "Our own cyc flood"].sort(),
    );
    const all = await s.post(`/api/productions/${to}/rig/copy-types`, { fromProductionId: from });
    expect(all.json.fixtureTypes).toHaveLength(STARTER_TYPES.length - 1);
    expect(all.json.skipped.sort()).toEqual([STARTER_TYPES[1].name, "Our own cyc flood"].sort());
    expect(await typeNames(s, to)).toEqual(await typeNames(s, from));
    const cyc = (await s.get(`/api/productions/${to}/fixture-types`)).json.fixtureTypes.find(
      (t: { name: string }) => t.name === "Our own cyc flood",
    );
    expect(cyc).toMatchObject({ family: "cyc", coneMaxDeg: 80, peakCandela: 3000 });
  });

  it("will not copy from a production the caller is not on (404), nor from the same one (400)", async () => {
    const { session: s } = await freshUser("copy-outsider");
    const to = await newProduction(s, "Copy outsider");
    const demoId = await demoProductionId(await demoSession("designer"));
    const outside = await s.post(`/api/productions/${to}/rig/copy-types`, { fromProductionId: demoId });
    expect(outside.status).toBe(404);
    const self = await s.post(`/api/productions/${to}/rig/copy-types`, { fromProductionId: to });
    expect(self.status).toBe(400);
    expect(self.json.error.fieldErrors.fromProductionId).toBeDefined();
    expect(await typeNames(s, to)).toEqual([]);
  });
});

async function upload(s: ApiSession, id: number) {
  const form = new FormData();
  form.set("file", new Blob([makePng(40, 30) as unknown as ArrayBuffer], { type: "image/png" }), "deck.png");
  const res = await fetch(`${BASE_URL}/api/productions/${id}/uploads`, {
    method: "POST",
    body: form,
    headers: { cookie: s.cookie },
  });
  expect(res.status).toBe(201);
}

/** A production with something in every corner: a pipe, types, units, a focus point, a cue with levels, a note, an upload. */
async function fullProduction(s: ApiSession, name: string) {
  const id = await newProduction(s, name);
  await s.post(`/api/productions/${id}/rig/starter-types`, {});
  const types = (await s.get(`/api/productions/${id}/fixture-types`)).json.fixtureTypes;
  const pos = (
    await s.post(`/api/productions/${id}/positions`, {
      name: "LX1",
      kind: "overhead-pipe",
      x1: -5,
      y1: 2,
      x2: 5,
      y2: 2,
      trimHeight: 7,
    })
  ).json.position;
  const point = (await s.post(`/api/productions/${id}/focus-points`, { name: "Area 1", x: 0, y: 3 })).json.focusPoint;
  const hung = await s.post(`/api/productions/${id}/fixtures`, {
    fixtures: [
      {
        positionId: pos.id,
        fixtureTypeId: types[0].id,
        unitNumber: "1",
        x: -1,
        y: 2,
        channel: 1,
        focusPointId: point.id,
      },
      { positionId: pos.id, fixtureTypeId: types[1].id, unitNumber: "2", x: 1, y: 2, channel: 2 },
    ],
  });
  expect(hung.status).toBe(201);
  const cues = await s.post(`/api/productions/${id}/cues/import`, {
    text: ["IDENT 3:0", "CUE 1", "TEXT Preset", "UP 5", "CHAN 1@80 2@50", "ENDDATA", ""].join("\r\n"),
  });
  expect(cues.status).toBe(200);
  const note = await s.post(`/api/productions/${id}/notes`, {
    subject: "production",
    kind: "general",
    body: "Check LX1",
  });
  expect(note.status).toBe(201);
  await upload(s, id);
  return id;
}

const uploadDir = (id: number) => path.resolve(process.env.STORAGE_DIR ?? ".data/uploads", `p${id}`);
const filesIn = (dir: string) => (existsSync(dir) ? readdirSync(dir, { recursive: true }).length : 0);

describe("archive, restore and delete", () => {
  it("archives off the list and restores, the owner only", async () => {
    const { session: s } = await freshUser("archive");
    const id = await newProduction(s, "Archive test");
    const listed = async () =>
      ((await s.get("/api/productions")).json.productions as Array<{ id: number; archivedAt: string | null }>).find(
        (p) => p.id === id,
      );
    expect((await listed())?.archivedAt).toBeNull();
    const put = await s.request("PUT", `/api/productions/${id}/archive`, { archived: true });
    expect(put.status).toBe(200);
    const archivedAt = (await listed())?.archivedAt;
    expect(archivedAt).toMatch(/^\d{4}-\d\d-\d\dT/);
    // archiving again keeps the first date
    await s.request("PUT", `/api/productions/${id}/archive`, { archived: true });
    expect((await listed())?.archivedAt).toBe(archivedAt);
    // everything is still there while archived
    expect((await s.get(`/api/productions/${id}`)).status).toBe(200);
    await s.request("PUT", `/api/productions/${id}/archive`, { archived: false });
    expect((await listed())?.archivedAt).toBeNull();
    // someone not on it learns nothing
    const other = await demoSession("designer");
    expect((await other.request("PUT", `/api/productions/${id}/archive`, { archived: true })).status).toBe(404);
    expect((await s.request("PUT", `/api/productions/${id}/archive`, { archived: "yes" })).status).toBe(400);
  });

  it("deletes only with the name typed, then removes every row and its uploaded files", async () => {
    const { session: s } = await freshUser("delete");
    const id = await fullProduction(s, "Delete test");
    const localDisk = !process.env.S3_BUCKET;
    if (localDisk) expect(filesIn(uploadDir(id))).toBeGreaterThan(0);

    const wrong = await s.request("DELETE", `/api/productions/${id}`, { confirmName: "Delete tset" });
    expect(wrong.status).toBe(400);
    expect(wrong.json.error.fieldErrors.confirmName).toBeDefined();
    const none = await s.request("DELETE", `/api/productions/${id}`);
    expect(none.status).toBe(400);
    expect((await s.get(`/api/productions/${id}`)).status).toBe(200);
    expect((await s.get(`/api/productions/${id}/fixtures`)).json.fixtures).toHaveLength(2);

    const done = await s.request("DELETE", `/api/productions/${id}`, { confirmName: "  delete TEST " });
    expect(done.status).toBe(200);
    expect(done.json.deleted).toMatchObject({ id, name: "Delete test", filesLeft: 0 });
    expect((await s.get(`/api/productions/${id}`)).status).toBe(404);
    expect((await s.get(`/api/productions/${id}/fixtures`)).status).toBe(404);
    const list = (await s.get("/api/productions")).json.productions as Array<{ id: number }>;
    expect(list.some((p) => p.id === id)).toBe(false);
    if (localDisk) expect(filesIn(uploadDir(id))).toBe(0);
  });
});
