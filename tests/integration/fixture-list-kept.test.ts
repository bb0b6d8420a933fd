// The rig list is built once per change of what it is computed from and then served from the server's
// copy (lib/http/stamped-json.ts, fingerprint lib/data/fixtures.ts fixtureListStamp). These tests make
// each kind of change the pools depend on and check that the very next read shows it, on this server and
// on the second one (whose copy is not told of a write made through the first).
import { describe, expect, it } from "vitest";
import { BASE_URL, freshUser } from "./support/api";

const SECOND = process.env.APP_URL_SECOND ?? BASE_URL;

type Listed = {
  id: number;
  version: number;
  notes: string | null;
  computed: { lensHeight: number; coneDeg: number; focus: { x: number; y: number } | null; head: unknown };
};

async function riggedProduction() {
  const { session: s } = await freshUser("list-kept");
  const id = (await s.post("/api/productions", { name: "Kept list" })).json.production.id as number;
  const api = `/api/productions/${id}`;
  const pipe = (
    await s.post(`${api}/positions`, {
      name: "Pipe",
      kind: "overhead-pipe",
      x1: -5,
      y1: 2,
      x2: 5,
      y2: 2,
      trimHeight: 6,
    })
  ).json.position;
  const type = (
    await s.post(`${api}/fixture-types`, {
      name: "Zoom spot",
      family: "profile",
      coneMinDeg: 18,
      coneMaxDeg: 34,
      peakCandela: 30000,
      dmxModes: [{ name: "dimmer", footprint: 1 }],
    })
  ).json.fixtureType;
  const point = (await s.post(`${api}/focus-points`, { name: "Centre", x: 0, y: -1 })).json.focusPoint;
  const created = await s.post(`${api}/fixtures`, {
    fixtures: [{ positionId: pipe.id, fixtureTypeId: type.id, unitNumber: "1", x: 1, y: 2, focusPointId: point.id }],
  });
  expect(created.status).toBe(201);
  return { s, id, api, pipe, type, point, fixture: created.json.fixtures[0] as Listed };
}

/** The list through a server, with the headers that matter here. */
async function list(server: string, cookie: string, id: number, extra: Record<string, string> = {}) {
  const res = await fetch(`${server}/api/productions/${id}/fixtures`, { headers: { cookie, ...extra } });
  const text = await res.text();
  return {
    status: res.status,
    etag: res.headers.get("etag"),
    cacheControl: res.headers.get("cache-control"),
    encoding: res.headers.get("content-encoding"),
    text,
    fixtures: (text ? JSON.parse(text).fixtures : []) as Listed[],
  };
}

describe("the rig list kept between changes", () => {
  it("answers with an ETag, 304 to a client that holds it, and compressed when asked", async () => {
    const { s, id } = await riggedProduction();
    const first = await list(BASE_URL, s.cookie, id);
    expect(first.status).toBe(200);
    expect(first.etag).toMatch(/^"[\w-]{20,}"$/);
    expect(first.cacheControl).toBe("private, no-cache");
    const again = await list(BASE_URL, s.cookie, id, { "if-none-match": first.etag ?? "" });
    expect(again.status).toBe(304);
    expect(again.text).toBe("");
    // A list of tags, weak or not, as browsers and proxies send them.
    const listed = await list(BASE_URL, s.cookie, id, { "if-none-match": `"other", W/${first.etag}` });
    expect(listed.status).toBe(304);
    // Next compresses for a client that asks (fetch unpacks it); the answer says so and reads the same.
    const packed = await list(BASE_URL, s.cookie, id, { "accept-encoding": "gzip" });
    expect(packed.encoding).toBe("gzip");
    expect(JSON.parse(packed.text)).toEqual(JSON.parse(first.text));
    const plain = await list(BASE_URL, s.cookie, id, { "accept-encoding": "identity" });
    expect(plain.encoding).toBeNull();
    expect(JSON.parse(plain.text)).toEqual(JSON.parse(first.text));
  });

  it("shows every change the pools depend on at the next read, through either server", async () => {
    const { s, id, api, pipe, type, point, fixture } = await riggedProduction();
    const base = await list(BASE_URL, s.cookie, id);
    expect(base.fixtures).toHaveLength(1);
    const seen = new Set([base.etag]);
    // Each step writes through one server and reads through the other, then the first: both copies are old.
    const step = async (write: () => Promise<{ status: number }>, check: (f: Listed[]) => void) => {
      expect((await write()).status).toBe(200);
      // (One server when the runner started no second one: `npm test -- <words>` without two-servers.)
      for (const server of new Set([SECOND, BASE_URL])) {
        const r = await list(server, s.cookie, id);
        expect(r.status).toBe(200);
        check(r.fixtures);
        if (server === BASE_URL) {
          expect(seen.has(r.etag), "a changed list has a new ETag").toBe(false);
          seen.add(r.etag);
        }
      }
    };
    let v = fixture.version;
    // The unit's own note.
    await step(
      () => s.patch(`${api}/fixtures/${fixture.id}`, { version: v, notes: "tape the cable" }),
      (f) => expect(f[0].notes).toBe("tape the cable"),
    );
    v += 1;
    // The pipe flown out: the default lens height follows the trim (6 m → 7 m, the lens drop unchanged).
    const before = (await list(BASE_URL, s.cookie, id)).fixtures[0].computed.lensHeight;
    await step(
      () => s.patch(`${api}/positions/${pipe.id}`, { version: pipe.version, trimHeight: 7 }),
      (f) => expect(f[0].computed.lensHeight).toBeCloseTo(before + 1, 9),
    );
    // The type's widest cone: a unit with no cone of its own takes it.
    await step(
      () => s.patch(`${api}/fixture-types/${type.id}`, { version: type.version, coneMaxDeg: 30 }),
      (f) => expect(f[0].computed.coneDeg).toBe(30),
    );
    // The focus point moved: the unit aims where the point now is.
    await step(
      () => s.patch(`${api}/focus-points/${point.id}`, { version: point.version, x: 2.5 }),
      (f) => expect(f[0].computed.focus?.x).toBe(2.5),
    );
    // The production's head height: the head-height pool moves with it.
    const production = (await s.get(api)).json.production;
    const headBefore = JSON.stringify((await list(BASE_URL, s.cookie, id)).fixtures[0].computed.head);
    await step(
      () => s.patch(api, { version: production.version, headHeight: 1.9 }),
      (f) => expect(JSON.stringify(f[0].computed.head)).not.toBe(headBefore),
    );
    // A unit hung, then taken down again.
    await step(
      async () => {
        const r = await s.post(`${api}/fixtures`, {
          fixtures: [{ positionId: pipe.id, fixtureTypeId: type.id, unitNumber: "2", x: -1, y: 2 }],
        });
        return { status: r.status === 201 ? 200 : r.status };
      },
      (f) => expect(f.map((x) => x.id)).toHaveLength(2),
    );
    await step(
      () => s.request("DELETE", `${api}/fixtures`, { ids: [fixture.id] }),
      (f) => expect(f.map((x) => x.id)).not.toContain(fixture.id),
    );
  });

  it("asks who is asking before anything kept is answered", async () => {
    const { s, id } = await riggedProduction();
    const held = await list(BASE_URL, s.cookie, id);
    const { session: outsider } = await freshUser("list-kept-outsider");
    const r = await list(BASE_URL, outsider.cookie, id, { "if-none-match": held.etag ?? "" });
    expect(r.status).toBe(404);
    const nobody = await list(BASE_URL, "", id, { "if-none-match": held.etag ?? "" });
    expect(nobody.status).toBe(401);
  });
});
