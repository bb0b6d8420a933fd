// What every entity route now shares through lib/http/crud-routes.ts, checked entity by entity over
// HTTP: ids in one spelling only, the role table on each route, and field-level refusals that name
// every refused field. The role expectations are shared/DESIGN.md's "Roles" table.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ApiSession, BASE_URL, freshUser } from "./support/api";
import { makePng } from "../support/png";
import { DEMO_USERS, demoIdFrom } from "../support/demo";

type Row = { id: number; version: number };
/** One row of an entity: its URL segment, the keys it is sent under, its row, and a patch a designer may send. */
type Sample = { segment: string; key: string; listKey: string; row: Row; patch: Record<string, unknown> };

const itemPath = (pid: number, x: Sample, id: string | number) =>
  `/api/productions/${pid}/${x.segment}/${encodeURIComponent(String(id))}`;
const hasDelete = (x: Sample) => x.segment !== "fixtures"; // fixtures are deleted in batches from the collection
const deleteQuery = (x: Sample) => (x.segment === "cues" ? `?version=${x.row.version}` : "");

async function uploadPng(s: ApiSession, productionId: number): Promise<Row> {
  const form = new FormData();
  form.set("file", new Blob([makePng(40, 30) as unknown as ArrayBuffer], { type: "image/png" }), "plan.png");
  const cookie = (s as unknown as { cookie: string }).cookie;
  const res = await fetch(`${BASE_URL}/api/productions/${productionId}/uploads`, {
    method: "POST",
    body: form,
    headers: { cookie },
  });
  expect(res.status).toBe(201);
  return (await res.json()).upload;
}

/** One row of each entity the factory serves, made by the designer in production `pid`. */
async function makeOneOfEach(s: ApiSession, pid: number, tag: string): Promise<Sample[]> {
  const at = (segment: string) => `/api/productions/${pid}/${segment}`;
  const made = async (segment: string, key: string, body: unknown) => {
    const r = await s.post(at(segment), body);
    expect(r.status, `${segment}: ${JSON.stringify(r.json)}`).toBe(201);
    return r.json[key] as Row & Record<string, unknown>;
  };
  const position = await made("positions", "position", {
    name: `Pipe ${tag}`,
    kind: "overhead-pipe",
    x1: -4,
    y1: 3,
    x2: 4,
    y2: 3,
    trimHeight: 7,
  });
  const type = await made("fixture-types", "fixtureType", {
    name: `Profile ${tag}`,
    family: "profile",
    coneMinDeg: 26,
    coneMaxDeg: 26,
    peakCandela: 40000,
    dmxModes: [{ name: "dimmer", footprint: 1 }],
  });
  const [fixture] = (await made("fixtures", "fixtures", {
    fixtures: [{ positionId: position.id, fixtureTypeId: type.id, unitNumber: "1", x: 1, y: 3 }],
  })) as unknown as Row[];
  const zone = await made("area-zones", "areaZone", {
    name: `Zone ${tag}`,
    polygon: [
      { x: -1, y: 1 },
      { x: 1, y: 1 },
      { x: 1, y: 3 },
    ],
  });
  // Past the demo's 28 cues and clear of other tests' numbers.
  const cueNumber = `${800 + Math.floor(Math.random() * 190)}.7`;
  return [
    { segment: "positions", key: "position", listKey: "positions", row: position, patch: { trimHeight: 7.5 } },
    {
      segment: "fixture-types",
      key: "fixtureType",
      listKey: "fixtureTypes",
      row: type,
      patch: { name: `Profile ${tag} b` },
    },
    { segment: "fixtures", key: "fixture", listKey: "fixtures", row: fixture, patch: { colour: "pale lavender" } },
    {
      segment: "focus-points",
      key: "focusPoint",
      listKey: "focusPoints",
      row: await made("focus-points", "focusPoint", { name: `Area ${tag}`, x: 0, y: 2 }),
      patch: { y: 2.5 },
    },
    {
      segment: "landmarks",
      key: "landmark",
      listKey: "landmarks",
      row: await made("landmarks", "landmark", { name: `lip ${tag}`, x1: -5, y1: -1.5, x2: 5, y2: -1.5 }),
      patch: { name: `edge ${tag}` },
    },
    { segment: "area-zones", key: "areaZone", listKey: "areaZones", row: zone, patch: { name: `Zone ${tag} b` } },
    {
      segment: "accessories",
      key: "accessory",
      listKey: "accessories",
      row: await made("accessories", "accessory", { fixtureId: fixture.id, kind: "iris" }),
      patch: { notes: "check the lever" },
    },
    { segment: "uploads", key: "upload", listKey: "uploads", row: await uploadPng(s, pid), patch: { opacity: 0.4 } },
    {
      segment: "cues",
      key: "cue",
      listKey: "cues",
      row: await made("cues", "cue", { number: cueNumber, label: "test look" }),
      patch: { label: "renamed look" },
    },
  ];
}

function sampleOf(samples: Sample[], segment: string): Sample {
  const found = samples.find((x) => x.segment === segment);
  if (!found) throw new Error(`no ${segment} sample`);
  return found;
}

/** The row as the entity's list has it now (undefined when gone). */
async function listed(s: ApiSession, pid: number, x: Sample): Promise<Row | undefined> {
  const r = await s.get(`/api/productions/${pid}/${x.segment}`);
  return (r.json[x.listKey] as Row[]).find((row) => row.id === x.row.id);
}

/** Deletes what makeOneOfEach made: the unit before its type, the position last. */
async function removeAll(s: ApiSession, pid: number, samples: Sample[]) {
  const last = ["fixtures", "fixture-types", "positions"];
  for (const x of samples.filter((x) => !last.includes(x.segment))) {
    const r = await s.request("DELETE", itemPath(pid, x, x.row.id) + deleteQuery(x));
    expect(r.status, `${x.segment}: ${JSON.stringify(r.json)}`).toBe(200);
  }
  const fixture = sampleOf(samples, "fixtures");
  expect((await s.request("DELETE", `/api/productions/${pid}/fixtures`, { ids: [fixture.row.id] })).status).toBe(200);
  for (const x of samples.filter((x) => x.segment !== "fixtures" && last.includes(x.segment))) {
    expect((await s.request("DELETE", itemPath(pid, x, x.row.id))).status, x.segment).toBe(200);
  }
}

describe("ids in one spelling only", () => {
  let s: ApiSession;
  let pid: number;
  let samples: Sample[];

  beforeAll(async () => {
    s = (await freshUser("ids")).session;
    pid = (await s.post("/api/productions", { name: "Id spelling test" })).json.production.id;
    samples = await makeOneOfEach(s, pid, "ids");
  });

  // Each of these reads as the row's own id to Number() or z.coerce.number(); "0x…" did reach the
  // row before. All must be 404 and leave the row as it was.
  const spellings = (id: number) => [
    `0x${id.toString(16)}`,
    `0${id}`,
    `${id}.0`,
    `+${id}`,
    `${id}e0`,
    ` ${id}`,
    `${id} `,
  ];

  it("answers every other spelling of a real id with 404 on PATCH, DELETE and GET, and writes nothing", async () => {
    for (const x of samples) {
      for (const spelt of spellings(x.row.id)) {
        const patched = await s.patch(itemPath(pid, x, spelt), { version: x.row.version, ...x.patch });
        expect(patched.status, `PATCH ${x.segment}/${spelt}`).toBe(404);
        expect(patched.json.error.code).toBe("not_found");
        if (hasDelete(x))
          expect(
            (await s.request("DELETE", itemPath(pid, x, spelt) + deleteQuery(x))).status,
            `DELETE ${x.segment}/${spelt}`,
          ).toBe(404);
      }
      expect((await listed(s, pid, x))?.version, `${x.segment} unchanged`).toBe(x.row.version);
    }
    for (const x of samples.filter((x) => x.segment === "cues" || x.segment === "fixtures")) {
      expect((await s.get(itemPath(pid, x, `0x${x.row.id.toString(16)}`))).status).toBe(404);
      expect((await s.get(itemPath(pid, x, x.row.id))).json[x.key].id).toBe(x.row.id);
    }
  });

  it("still takes the plain spelling: a designer's patch lands on every entity", async () => {
    for (const x of samples) {
      const r = await s.patch(itemPath(pid, x, x.row.id), { version: x.row.version, ...x.patch });
      expect(r.status, `${x.segment}: ${JSON.stringify(r.json)}`).toBe(200);
      expect(r.json[x.key]).toMatchObject({ id: x.row.id, ...(x.segment === "fixtures" ? {} : x.patch) });
      x.row = r.json[x.key];
    }
  });

  it("refuses a version in the query string that is not plain digits", async () => {
    const cue = sampleOf(samples, "cues");
    const r = await s.request("DELETE", `${itemPath(pid, cue, cue.row.id)}?version=0x${cue.row.version.toString(16)}`);
    expect(r.status).toBe(400);
    expect(r.json.error.fieldErrors).toHaveProperty("version");
  });

  it("deletes by the plain id, and the row is gone", async () => {
    await removeAll(s, pid, samples);
    for (const x of samples) {
      expect(await listed(s, pid, x), x.segment).toBeUndefined();
      if (hasDelete(x))
        expect((await s.request("DELETE", itemPath(pid, x, x.row.id) + deleteQuery(x))).status, x.segment).toBe(404);
    }
  });
});

describe("roles on every entity route (DESIGN.md, Roles)", () => {
  const as: Record<keyof typeof DEMO_USERS, ApiSession> = {} as never;
  let pid: number;
  let samples: Sample[];
  const sample = (segment: string) => sampleOf(samples, segment);

  beforeAll(async () => {
    for (const [role, email] of Object.entries(DEMO_USERS))
      as[role as keyof typeof DEMO_USERS] = await new ApiSession().signIn(email);
    pid = demoIdFrom((await as.designer.get("/api/productions")).json);
    samples = await makeOneOfEach(as.designer, pid, `roles${Date.now() % 100000}`);
  });

  // The demo production is shared: take every added row away again.
  afterAll(() => removeAll(as.designer, pid, samples));

  it("lets every member read every list", async () => {
    for (const x of samples) expect(await listed(as.viewer, pid, x), x.segment).toBeDefined();
  });

  // Who may not write each entity as a whole: the plan (plot.edit) is the designer's; accessories are
  // electrics (designer and electrician).
  const refusedWholly: Array<[string, Array<keyof typeof DEMO_USERS>]> = [
    ["positions", ["electrician", "stageManager", "viewer"]],
    ["focus-points", ["electrician", "stageManager", "viewer"]],
    ["landmarks", ["electrician", "stageManager", "viewer"]],
    ["area-zones", ["electrician", "stageManager", "viewer"]],
    ["uploads", ["electrician", "stageManager", "viewer"]],
    ["accessories", ["stageManager", "viewer"]],
  ];

  it("refuses PATCH, DELETE and POST with 403 to roles without the right, and changes nothing", async () => {
    for (const [segment, roles] of refusedWholly) {
      const x = sample(segment);
      for (const role of roles) {
        expect(
          (await as[role].patch(itemPath(pid, x, x.row.id), { version: x.row.version, ...x.patch })).status,
          `${role} PATCH ${segment}`,
        ).toBe(403);
        expect((await as[role].request("DELETE", itemPath(pid, x, x.row.id))).status, `${role} DELETE ${segment}`).toBe(
          403,
        );
        if (segment !== "uploads")
          expect(
            (await as[role].post(`/api/productions/${pid}/${segment}`, {})).status,
            `${role} POST ${segment}`,
          ).toBe(403);
      }
      expect((await listed(as.viewer, pid, x))?.version, `${segment} unchanged`).toBe(x.row.version);
    }
  });

  it("refuses field by field with 403 and fieldErrors naming each refused field", async () => {
    const cases: Array<[keyof typeof DEMO_USERS, string, Record<string, unknown>, string[]]> = [
      // colour and channel: designer only; circuit: designer and electrician.
      ["electrician", "fixtures", { colour: "full CTB", channel: 901, circuit: "B2" }, ["colour", "channel"]],
      // a type's name is the designer's; its wattage the electrician's too.
      ["electrician", "fixture-types", { name: "Renamed", wattage: 575 }, ["name"]],
      // the stage manager writes page and call note, not label or levels.
      ["stageManager", "cues", { label: "nope", page: "4" }, ["label"]],
    ];
    for (const [role, segment, patch, refused] of cases) {
      const x = sample(segment);
      const r = await as[role].patch(itemPath(pid, x, x.row.id), { version: x.row.version, ...patch });
      expect(r.status, `${role} ${segment}`).toBe(403);
      expect(Object.keys(r.json.error.fieldErrors).sort(), `${role} ${segment}`).toEqual([...refused].sort());
      // The message lists the same fields, in the order the body's schema reads them.
      expect(r.json.error.message).toBe(
        `Your role cannot change: ${Object.keys(r.json.error.fieldErrors).join(", ")}.`,
      );
    }
    const fixture = sample("fixtures");
    const bulk = await as.electrician.post(`/api/productions/${pid}/fixtures/bulk`, {
      items: [{ id: fixture.row.id, version: fixture.row.version }],
      action: { kind: "colour", colour: "light frost" },
    });
    expect(bulk.status).toBe(403);
    expect(bulk.json.error.fieldErrors).toEqual({ colour: ["not editable by your role"] });
  });

  it("refuses a role that may write no field of the entity before reading the body", async () => {
    // DESIGN.md Roles: the stage manager edits no fixture or type field, the electrician no cue field,
    // the viewer nothing. A body no schema accepts still gets 403 (naming what it tried to write), not a
    // 400 that describes the schema.
    const cases: Array<[keyof typeof DEMO_USERS, string]> = [
      ["stageManager", "fixtures"],
      ["stageManager", "fixture-types"],
      ["electrician", "cues"],
      ["viewer", "cues"],
      ["viewer", "fixtures"],
    ];
    for (const [role, segment] of cases) {
      const x = sample(segment);
      const named = await as[role].patch(itemPath(pid, x, x.row.id), {
        version: "not-a-version",
        page: 4,
        circuit: ["B2"],
      });
      expect(named.status, `${role} ${segment}`).toBe(403);
      expect(named.json.error.fieldErrors, `${role} ${segment}`).toEqual({
        page: ["not editable by your role"],
        circuit: ["not editable by your role"],
      });
      const bare = await as[role].patch(itemPath(pid, x, x.row.id), { version: "not-a-version" });
      expect(bare.status, `${role} ${segment}`).toBe(403);
      expect(bare.json.error.fieldErrors, `${role} ${segment}`).toBeUndefined();
    }
    const bulk = await as.stageManager.post(`/api/productions/${pid}/fixtures/bulk`, { items: "none" });
    expect(bulk.status).toBe(403);
  });

  it("refuses deleting a cue or a type to roles without the right", async () => {
    const cue = sample("cues");
    expect((await as.stageManager.request("DELETE", itemPath(pid, cue, cue.row.id) + deleteQuery(cue))).status).toBe(
      403,
    );
    const type = sample("fixture-types");
    expect((await as.electrician.request("DELETE", itemPath(pid, type, type.row.id))).status).toBe(403);
  });

  it("answers an outsider 404 and a signed-out caller 401, whatever the id", async () => {
    const outsider = (await freshUser("outsider")).session;
    const signedOut = new ApiSession();
    for (const x of samples) {
      for (const id of [x.row.id, `0x${x.row.id.toString(16)}`]) {
        expect(
          (await outsider.patch(itemPath(pid, x, id), { version: x.row.version, ...x.patch })).status,
          `outsider ${x.segment}/${id}`,
        ).toBe(404);
        expect(
          (await signedOut.patch(itemPath(pid, x, id), { version: x.row.version, ...x.patch })).status,
          `signed out ${x.segment}/${id}`,
        ).toBe(401);
      }
      expect((await outsider.get(`/api/productions/${pid}/${x.segment}`)).status).toBe(404);
    }
  });
});
