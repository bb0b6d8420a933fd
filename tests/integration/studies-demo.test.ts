// The demo production opens the studies on something to look at: acting areas over the stage, performer
// marks and scenery that cast shadows, all from the demo seed (seeders/*-demo-studies.cjs).
import { describe, expect, it } from "vitest";
import { demoProductionId, demoSession } from "./support/api";

const AREAS = [
  "Down right",
  "Down centre",
  "Down left",
  "Mid right",
  "Mid centre",
  "Mid left",
  "Up right",
  "Up centre",
  "Up left",
];
const PERFORMERS = ["Harbour master", "Net mender", "Lamp child", "Fog singer"];
const PANELS = ["Sea wall flat", "Net rack"];

type Pt = { x: number; y: number };
const shoelace = (p: Pt[]) =>
  Math.abs(p.reduce((s, a, i) => s + a.x * p[(i + 1) % p.length].y - p[(i + 1) % p.length].x * a.y, 0)) / 2;

describe("studies on the demo production", () => {
  it("has acting areas that tile the stage from the setting line up to the last electric, without overlaps", async () => {
    const s = await demoSession("viewer");
    const id = await demoProductionId(s);
    const zones = (await s.get(`/api/productions/${id}/area-zones`)).json.areaZones as {
      name: string;
      polygon: Pt[];
    }[];
    const demo = zones.filter((z) => AREAS.includes(z.name));
    expect(demo.map((z) => z.name).sort()).toEqual([...AREAS].sort());
    const all = demo.flatMap((z) => z.polygon);
    const box = {
      minX: Math.min(...all.map((p) => p.x)),
      maxX: Math.max(...all.map((p) => p.x)),
      minY: Math.min(...all.map((p) => p.y)),
      maxY: Math.max(...all.map((p) => p.y)),
    };
    // hand-worked: a 9 m × 8 m block from the setting line (y 0) to y 8, inside the 10 m proscenium
    expect(box).toEqual({ minX: -4.5, maxX: 4.5, minY: 0, maxY: 8 });
    // Areas that neither overlap nor leave gaps add up to the block's area (shoelace, common practice).
    expect(demo.reduce((sum, z) => sum + shoelace(z.polygon), 0)).toBeCloseTo(9 * 8, 9);
  });

  it("lights every demo area with the rig at full and casts shadows of each performer and scenery piece", async () => {
    const s = await demoSession("designer");
    const id = await demoProductionId(s);
    const p = `/api/productions/${id}`;
    const coverage = await s.post(`${p}/studies/coverage`, { source: { kind: "full" }, resolution: 0.25 });
    expect(coverage.status).toBe(200);
    const rows = (coverage.json.areas as { name: string; count: number; mean: number | null }[]).filter((a) =>
      AREAS.includes(a.name),
    );
    expect(rows).toHaveLength(AREAS.length);
    for (const a of rows) {
      expect(a.count, a.name).toBeGreaterThan(0);
      expect(a.mean, a.name).toBeGreaterThan(0);
    }

    const shadows = await s.post(`${p}/studies/shadows`, { source: { kind: "full" } });
    expect(shadows.status).toBe(200);
    type Occ = { kind: string; name: string; shadows: { lands: string; penumbra: Pt[]; length: number | null }[] };
    const occluders = shadows.json.occluders as Occ[];
    for (const name of [...PERFORMERS, ...PANELS]) {
      const o = occluders.find((x) => x.name === name);
      expect(o, name).toBeTruthy();
      const onDeck = o!.shadows.filter((x) => x.lands === "deck");
      expect(onDeck.length, name).toBeGreaterThan(0);
      expect(
        onDeck.every((x) => x.penumbra.length >= 3 && (x.length ?? 0) > 0),
        name,
      ).toBe(true);
    }
    expect(occluders.filter((o) => PERFORMERS.includes(o.name)).every((o) => o.kind === "performer")).toBe(true);
  });
});
