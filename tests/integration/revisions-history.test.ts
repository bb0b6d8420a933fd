// A thing's history holds every write that touched it, including the ones made through another thing:
// a unit removed with its position, a unit whose focus point was deleted, a cue moved by a renumber.
import { beforeAll, describe, expect, it } from "vitest";
import type { ApiSession } from "./support/api";
import { rigProduction } from "./support/rig";

let s: ApiSession;
let base = "";
let units: Array<{ id: number }> = [];
const cueIds: number[] = [];
let boomId = 0;
let pointId = 0;

const history = async (entity: string, id: number) => {
  const r = await s.get(`${base}/history?entity=${entity}&id=${id}`);
  expect(r.status, JSON.stringify(r.json)).toBe(200);
  return r.json.history as Array<Record<string, unknown>>;
};

beforeAll(async () => {
  const p = await rigProduction();
  s = p.s;
  base = `/api/productions/${p.id}`;
  boomId = p.boom.id;
  pointId = (await s.post(`${base}/focus-points`, { name: "Area 3", x: 1, y: 2 })).json.focusPoint.id;
  const made = await s.post(`${base}/fixtures`, {
    fixtures: ["1", "2"].map((unitNumber) => ({
      positionId: boomId,
      fixtureTypeId: p.profile.id,
      unitNumber,
      focusPointId: pointId,
      x: 7,
      y: 2,
    })),
  });
  expect(made.status, JSON.stringify(made.json)).toBe(201);
  units = made.json.fixtures;
  for (const number of [1, 2]) cueIds.push((await s.post(`${base}/cues`, { number })).json.cue.id);
}, 120_000);

describe("history through another thing's write", () => {
  it("records each aimed unit's new mark when its focus point is deleted", async () => {
    expect((await s.request("DELETE", `${base}/focus-points/${pointId}`)).status).toBe(200);
    const lines = await history("fixture", units[0].id);
    const byField = Object.fromEntries(lines.filter((l) => l.action === "update").map((l) => [l.field, l]));
    expect(byField.focusPointId).toMatchObject({ after: null });
    expect(byField.focusX).toMatchObject({ after: 1 }); // the mark stays where the point was
    expect(byField.focusY).toMatchObject({ after: 2 });
  });

  it("ends each unit's history with its removal when its position is deleted", async () => {
    expect((await s.request("DELETE", `${base}/positions/${boomId}`)).status).toBe(200);
    for (const u of units) expect((await history("fixture", u.id))[0]).toMatchObject({ action: "delete" });
  });

  it("gives each renumbered cue a line with its number before and after", async () => {
    expect((await s.post(`${base}/cues/renumber`, { from: 1, to: 2, start: 10, step: 10 })).status).toBe(200);
    expect((await history("cue", cueIds[1]))[0]).toMatchObject({ field: "number", before: 2, after: 20 });
    expect((await history("cue", cueIds[0]))[0]).toMatchObject({ field: "number", before: 1, after: 10 });
  });
});
