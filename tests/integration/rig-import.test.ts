// The import matrix against the real MariaDB, through the route handler.
import { describe, expect, it } from "vitest";
import { demoProductionId, demoSession, freshUser } from "./support/api";
import { fixturesOf, rigProduction, upload, xlsxBytes } from "./support/rig";

const preview = { mode: "preview" };
const commit = { mode: "commit" };

describe("real-world CSV files", () => {
  it("reads a BOM, semicolons, CRLF, quoted line breaks, empty rows, feet and inches and numbers as text", async () => {
    const { s, id } = await rigProduction();
    const csv =
      "\ufeffPosition;Unit;Type;Channel;Address;Lens height;X;Notes\r\n" +
      'LX1;1;Profile 26;"0101";1;21\' 4";-2,5;"check frame; tight\r\nsecond line"\r\n' +
      ";;;;;;;\r\n\r\n" +
      "lx1;2;profile 26;102;2;6.5 m;2.5;\r\n";
    const p = await upload(s, id, { name: "rig.csv", body: csv }, preview);
    expect(p.status).toBe(200);
    expect(p.json.preview).toMatchObject({
      rowCount: 2,
      errorCount: 0,
      counts: { create: 2, update: 0, unchanged: 0 },
    });
    const c = await upload(s, id, { name: "rig.csv", body: csv }, commit);
    expect(c.status).toBe(200);
    const fx = await fixturesOf(s, id);
    const one = fx.find((f) => f.unitNumber === "1");
    expect(one).toMatchObject({
      channel: 101,
      address: 1,
      x: -2.5,
      notes: "check frame; tight\r\nsecond line",
      positionName: "LX1",
    });
    expect(one.lensHeight).toBeCloseTo(21 * 0.3048 + 4 * 0.0254, 12); // NIST SP 811: 1 ft = 0.3048 m, 1 in = 0.0254 m
    expect(fx.find((f) => f.unitNumber === "2").lensHeight).toBe(6.5);
  });

  it("renames duplicated headers, says so, and maps the first copy", async () => {
    const { s, id } = await rigProduction();
    const r = await upload(
      s,
      id,
      { name: "dup.csv", body: "Position,Unit,Type,Colour,Colour\nLX1,5,Profile 26,pale blue,straw\n" },
      preview,
    );
    expect(r.json.preview.headers).toEqual(["Position", "Unit", "Type", "Colour", "Colour (2)"]);
    expect(r.json.preview.mapping).toEqual(["position", "unitNumber", "type", "colour", "ignore"]);
    expect(r.json.preview.notes[0]).toMatch(/more than once/);
  });

  it("imports 10,000 rows in one go", async () => {
    const { s, id } = await rigProduction();
    const lines = ["Position,Unit,Type,Channel"];
    for (let i = 1; i <= 5000; i++) lines.push(`LX1,${i},Profile 26,${i}`, `Boom SL,${i},Profile 26,${5000 + i}`);
    const r = await upload(s, id, { name: "big.csv", body: lines.join("\n") }, commit);
    expect(r.status).toBe(200);
    expect(r.json.result.counts.create).toBe(10000);
    expect(await fixturesOf(s, id)).toHaveLength(10000);
  }, 120_000);
});

describe("workbooks", () => {
  it("finds the fixture sheet behind a cover sheet and fills merged position cells", async () => {
    const { s, id } = await rigProduction();
    const body = await xlsxBytes((wb) => {
      wb.addWorksheet("Notes").addRow(["Rig for the tour"]);
      const ws = wb.addWorksheet("Hang");
      ws.addRow(["Position", "Unit", "Type", "Circuit", "Cone"]);
      ws.addRow(["LX1", 1, "Profile 26", "A12", "26"]);
      ws.addRow([null, 2, "Profile 26", 14, 19]);
      ws.mergeCells("A2:A3");
    });
    const p = await upload(s, id, { name: "tour.xlsx", body }, preview);
    expect(p.json.preview).toMatchObject({
      sheet: "Hang",
      sheetNames: ["Notes", "Hang"],
      errorCount: 0,
      counts: { create: 2 },
    });
    await upload(s, id, { name: "tour.xlsx", body }, commit);
    const fx = await fixturesOf(s, id);
    expect(fx.map((f) => [f.positionName, f.unitNumber, f.circuit, f.coneDeg])).toEqual([
      ["LX1", "1", "A12", 26],
      ["LX1", "2", "14", 19],
    ]);
  });

  it("reads a sheet the user names, and refuses a name that is not there", async () => {
    const { s, id } = await rigProduction();
    const body = await xlsxBytes((wb) => {
      wb.addWorksheet("A").addRow(["Position", "Unit"]);
      wb.addWorksheet("B").addRow(["Position", "Unit"]);
    });
    expect((await upload(s, id, { name: "two.xlsx", body }, { ...preview, sheet: "B" })).json.preview.sheet).toBe("B");
    const bad = await upload(s, id, { name: "two.xlsx", body }, { ...preview, sheet: "C" });
    expect(bad.status).toBe(400);
    expect(bad.json.error.message).toContain("A, B");
  });
});

describe("files that are not what they say", () => {
  it("answers empty, binary, legacy and oversized files with a clear 4xx, never a 500", async () => {
    const { s, id } = await rigProduction();
    const empty = await upload(s, id, { name: "empty.csv", body: "" }, preview);
    expect(empty.status).toBe(400);
    expect(empty.json.error.message).toMatch(/empty/);
    const png = await upload(
      s,
      id,
      { name: "photo.csv", body: new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]) },
      preview,
    );
    expect(png.status).toBe(400);
    expect(png.json.error.message).toMatch(/binary/);
    const xls = await upload(
      s,
      id,
      { name: "old.csv", body: new Uint8Array([0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1]) },
      preview,
    );
    expect(xls.json.error.message).toMatch(/\.xls/);
    const big = await upload(s, id, { name: "huge.csv", body: "x".repeat(9 * 1024 * 1024) }, preview);
    expect(big.status).toBe(413);
    expect(big.json.error.message).toMatch(/limit/);
    const noFile = await s.post(`/api/productions/${id}/import`, { mode: "preview" });
    expect(noFile.status).toBe(400);
  });
});

describe("row errors and all-or-nothing", () => {
  it("lists every bad row with its column, and a commit with any error writes nothing", async () => {
    const { s, id } = await rigProduction();
    const csv = [
      "Position,Unit,Type,Address,Hung,Lens height",
      "LX1,1,Profile 26,1,yes,6",
      "LX1,2,Profile 26,513,yes,6",
      "LX1,3,Profile 26,4,perhaps,6",
      "LX1,4,Profile 26,5,no,tall",
      "Nowhere,5,Profile 26,6,no,6",
      "LX1,6,Profile 26,7,no,6",
    ].join("\n");
    const p = await upload(s, id, { name: "bad.csv", body: csv }, preview);
    expect(p.json.preview.errors).toEqual([
      { row: 3, column: "Address", message: "DMX address must be 1–512" }, // ANSI E1.11: slots 1–512
      { row: 4, column: "Hung", message: '"perhaps" is not yes or no' },
      { row: 5, column: "Lens height", message: expect.stringContaining("tall") },
      { row: 6, column: "Position", message: expect.stringContaining('no position called "Nowhere"') },
    ]);
    const c = await upload(s, id, { name: "bad.csv", body: csv }, commit);
    expect(c.status).toBe(400);
    expect(c.json.error.message).toMatch(/Nothing was imported: 4 problems.*row 3, Address/);
    expect(await fixturesOf(s, id)).toHaveLength(0);
  });

  it("refuses a fixture that would straddle two universes", async () => {
    const { s, id } = await rigProduction();
    const r = await upload(
      s,
      id,
      { name: "dmx.csv", body: "Position,Unit,Type,Address\nLX1,1,Wash 13,500\nLX1,2,Wash 13,501\n" },
      preview,
    );
    // ANSI E1.11: a 13-slot fixture fits at 500 (500–512) but not at 501
    expect(r.json.preview.errors).toEqual([
      { row: 3, column: "Address", message: "A 13-slot fixture at address 501 runs past slot 512" },
    ]);
  });

  it("creates missing positions and types only when asked", async () => {
    const { s, id } = await rigProduction();
    const csv = "Position,Unit,Type\nBoom SR,1,Generic fresnel 150 mm\nBoom SR,2,Mystery box\n";
    const reported = await upload(s, id, { name: "new.csv", body: csv }, preview);
    expect(reported.json.preview.errorCount).toBe(4);
    const created = await upload(s, id, { name: "new.csv", body: csv }, { ...commit, createMissing: true });
    expect(created.json.result).toMatchObject({
      newPositions: ["Boom SR"],
      newTypes: ["Generic fresnel 150 mm", "Mystery box"],
    });
    const types = (await s.get(`/api/productions/${id}/fixture-types`)).json.fixtureTypes;
    expect(types.find((t: any) => t.name === "Generic fresnel 150 mm")).toMatchObject({
      family: "fresnel",
      coneMaxDeg: 60,
    });
    const positions = (await s.get(`/api/productions/${id}/positions`)).json.positions;
    expect(positions.find((p: any) => p.name === "Boom SR").kind).toBe("boom");
  });

  it("updates matched fixtures with a version bump, leaves equal rows alone, and remembers the mapping", async () => {
    const { s, id } = await rigProduction();
    await upload(
      s,
      id,
      { name: "a.csv", body: "Where,No.,Kind,Gel\nLX1,1,Profile 26,pale blue\nLX1,2,Profile 26,pale amber\n" },
      { ...commit, mapping: ["position", "unitNumber", "type", "colour"] },
    );
    const before = await fixturesOf(s, id);
    const again = await upload(
      s,
      id,
      {
        name: "b.csv",
        body: "where,no.,kind,gel\nLX1,1,Profile 26,pale blue + light frost\nLX1,2,Profile 26,pale amber\n",
      },
      preview,
    );
    expect(again.json.preview.mapping).toEqual(["position", "unitNumber", "type", "colour"]);
    expect(again.json.preview.counts).toEqual({ create: 0, update: 1, unchanged: 1 });
    await upload(
      s,
      id,
      {
        name: "b.csv",
        body: "where,no.,kind,gel\nLX1,1,Profile 26,pale blue + light frost\nLX1,2,Profile 26,pale amber\n",
      },
      commit,
    );
    const after = await fixturesOf(s, id);
    const one = (list: any[], u: string) => list.find((f) => f.unitNumber === u);
    expect(one(after, "1")).toMatchObject({ colour: "pale blue + light frost", version: one(before, "1").version + 1 });
    expect(one(after, "2").version).toBe(one(before, "2").version);
  });
});

describe("roles", () => {
  it("lets the electrician change electrics only, naming the designer fields a row would change", async () => {
    const el = await demoSession("electrician");
    const id = await demoProductionId(el);
    const fx = await fixturesOf(el, id);
    const target = fx[0];
    const other = fx[1];
    const refused = await upload(
      el,
      id,
      {
        name: "el.csv",
        body: `Position,Unit,Circuit,Colour\n${target.positionName},${target.unitNumber},E-77,deep amber\n`,
      },
      preview,
    );
    expect(refused.json.preview.errors).toEqual([
      { row: 2, column: "Colour", message: expect.stringMatching(/^Your role cannot change Colour/) },
    ]);
    const newUnit = await upload(
      el,
      id,
      { name: "el.csv", body: `Position,Unit,Circuit\n${target.positionName},999,E-1\n` },
      preview,
    );
    expect(newUnit.json.preview.errors[0].message).toMatch(/only the designer can add fixtures/);
    const ok = await upload(
      el,
      id,
      {
        name: "el.csv",
        body: `Position,Unit,Dimmer,Colour\n${other.positionName},${other.unitNumber},D-${other.id},${other.colour ?? ""}\n`,
      },
      commit,
    );
    expect(ok.status).toBe(200);
    expect((await fixturesOf(el, id)).find((f) => f.id === other.id).dimmer).toBe(`D-${other.id}`);
  });

  it("refuses import to the viewer and stage manager, and hides the production from outsiders", async () => {
    const viewer = await demoSession("viewer");
    const id = await demoProductionId(viewer);
    expect((await upload(viewer, id, { name: "v.csv", body: "Position,Unit\nX,1\n" }, preview)).status).toBe(403);
    const sm = await demoSession("stageManager");
    expect((await upload(sm, id, { name: "v.csv", body: "Position,Unit\nX,1\n" }, preview)).status).toBe(403);
    const { session: outsider } = await freshUser("outsider");
    expect((await upload(outsider, id, { name: "v.csv", body: "Position,Unit\nX,1\n" }, preview)).status).toBe(404);
  });
});
