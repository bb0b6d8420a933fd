// Generated JSON bodies against the main write routes: valid bodies with fields swapped for hostile
// values (wrong types, huge or negative numbers, long text, nested objects, prototype keys, extra
// fields) and arbitrary JSON. Every answer is a 2xx or a 4xx with a message, never a 500; a refused
// body writes nothing (the production's change log does not grow, and it grows on every success);
// the server stays healthy throughout.
import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Connection } from "mariadb";
import { BASE_URL, type ApiSession } from "./support/api";
import { rigProduction } from "./support/rig";
import { openTestDb } from "./concurrency-support";

const PER_ROUTE = 100;
let db: Connection;
let s: ApiSession;
let pid: number;
let ids: { position: number; type: number; fixture: number; cue: number };

beforeAll(async () => {
  db = await openTestDb();
  const p = await rigProduction();
  ({ s, id: pid } = p);
  const fixture = (
    await s.post(`/api/productions/${pid}/fixtures`, {
      fixtures: [{ positionId: p.lx1.id, fixtureTypeId: p.profile.id, unitNumber: "1", x: 0, y: 1 }],
    })
  ).json.fixtures[0];
  const cue = (await s.post(`/api/productions/${pid}/cues`, { number: 1, levels: { 1: 50 } })).json.cue;
  ids = { position: p.lx1.id, type: p.profile.id, fixture: fixture.id, cue: cue.id };
});
afterAll(async () => {
  await db?.end();
});

const changeCount = async () =>
  Number((await db.query("SELECT COUNT(*) AS n FROM change_entries WHERE production_id = ?", [pid]))[0].n);

// Values a careless or hostile client sends in place of a field's own.
const hostile = fc.oneof(
  fc.constantFrom(
    null,
    true,
    false,
    0,
    -1,
    1e308,
    -1e308,
    2 ** 53 + 1,
    0.1,
    "",
    " ",
    "NaN",
    "Infinity",
    "1e999",
    "-0",
    "__proto__",
    "constructor",
    "'; DROP TABLE fixtures; --",
    "<script>alert(1)</script>",
    "\u0000",
    "\ud800",
    "😀".repeat(50),
  ),
  fc.string({ maxLength: 40 }),
  fc.integer(),
  fc.double(),
  fc.constant("x".repeat(5000)),
  fc.array(fc.integer(), { maxLength: 4 }),
  fc.dictionary(fc.string({ maxLength: 6 }), fc.jsonValue({ maxDepth: 2 }), { maxKeys: 3 }),
  fc.constant(JSON.parse('{"__proto__":{"admin":true}}')),
);

/** A valid body with some fields replaced, some removed and maybe an unknown one added; or any JSON at all. */
function bodies(valid: Record<string, unknown>) {
  const keys = Object.keys(valid);
  const mutated = fc
    .tuple(
      fc.subarray(keys),
      fc.array(hostile, { minLength: keys.length, maxLength: keys.length }),
      fc.subarray(keys, { maxLength: 1 }),
      fc.option(fc.tuple(fc.constantFrom("extra", "id", "productionId", "version", "__proto__"), hostile)),
    )
    .map(([replace, values, drop, extra]) => {
      const body: Record<string, unknown> = { ...valid };
      replace.forEach((k, i) => (body[k] = values[i]));
      for (const k of drop) delete body[k];
      // An own property even for "__proto__", as JSON.parse on the server will make it.
      if (extra)
        Object.defineProperty(body, extra[0], {
          value: extra[1],
          enumerable: true,
          writable: true,
          configurable: true,
        });
      return body as unknown;
    });
  return fc.oneof({ weight: 4, arbitrary: mutated }, { weight: 1, arbitrary: fc.jsonValue({ maxDepth: 3 }) });
}

type Case = {
  name: string;
  method: "POST" | "PATCH";
  path: () => string;
  valid: () => Record<string, unknown>;
  wrap?: (b: unknown) => unknown;
};
const CASES: Case[] = [
  {
    name: "create fixtures",
    method: "POST",
    path: () => `/api/productions/${pid}/fixtures`,
    valid: () => ({
      positionId: ids.position,
      fixtureTypeId: ids.type,
      unitNumber: "7",
      x: 0,
      y: 1,
      channel: 12,
      colour: "pale lavender",
    }),
    wrap: (b) => ({ fixtures: [b] }),
  },
  {
    name: "change a fixture",
    method: "PATCH",
    path: () => `/api/productions/${pid}/fixtures/${ids.fixture}`,
    valid: () => ({ version: 1, purpose: "down centre", channel: 3, universe: 1, address: 10, focused: true }),
  },
  {
    name: "bulk edit",
    method: "POST",
    path: () => `/api/productions/${pid}/fixtures/bulk`,
    valid: () => ({ items: [{ id: ids.fixture, version: 1 }], action: { kind: "channels", start: 1, step: 1 } }),
  },
  {
    name: "create a cue",
    method: "POST",
    path: () => `/api/productions/${pid}/cues`,
    valid: () => ({ number: "5.5", upTime: "1:30", levels: { 1: 40 }, label: "dawn" }),
  },
  {
    name: "change a cue",
    method: "PATCH",
    path: () => `/api/productions/${pid}/cues/${ids.cue}`,
    valid: () => ({ version: 1, label: "night", levels: { 2: 100 }, parts: [{ part: 1, upTime: 3, channels: [2] }] }),
  },
  {
    name: "create a position",
    method: "POST",
    path: () => `/api/productions/${pid}/positions`,
    valid: () => ({ name: "Boom SR", kind: "boom", x1: -7, y1: 2, trimHeight: 5 }),
  },
  {
    name: "create a fixture type",
    method: "POST",
    path: () => `/api/productions/${pid}/fixture-types`,
    valid: () => ({
      name: "Fresnel 8",
      family: "fresnel",
      coneMinDeg: 10,
      coneMaxDeg: 60,
      peakCandela: 20000,
      dmxModes: [{ name: "dimmer", footprint: 1 }],
    }),
  },
  {
    name: "import cues",
    method: "POST",
    path: () => `/api/productions/${pid}/cues/import`,
    valid: () => ({ text: "IDENT 3:0\r\nCUE 1\r\nCHAN 1@50\r\nENDDATA\r\n", mode: "state" }),
  },
  {
    name: "create a production",
    method: "POST",
    path: () => "/api/productions",
    valid: () => ({ name: "Fuzz", venue: "Hall", displayUnits: "metric" }),
  },
];

describe("generated bodies on the main write routes", () => {
  for (const c of CASES) {
    it(`${c.name}: never a 500, and a refused body writes nothing`, async () => {
      const samples = fc.sample(bodies(c.valid()), { numRuns: PER_ROUTE, seed: 0x7f1 + c.name.length });
      const statuses = new Map<number, number>();
      for (const sample of samples) {
        const body = c.wrap ? c.wrap(sample) : sample;
        const before = await changeCount();
        const r = await s.request(c.method, c.path(), undefined, JSON.stringify(body));
        statuses.set(r.status, (statuses.get(r.status) ?? 0) + 1);
        const after = await changeCount();
        if (r.status >= 500)
          throw new Error(
            `${c.name}: ${r.status} for ${JSON.stringify(body).slice(0, 300)}: ${JSON.stringify(r.json).slice(0, 300)}`,
          );
        if (r.status >= 400) {
          expect(r.json?.error?.message, JSON.stringify(body).slice(0, 200)).toBeTruthy();
          // Nothing half-written: a refused request leaves the change log (hence every logged table) as it was.
          expect(after, `${c.name}: refused (${r.status}) but wrote for ${JSON.stringify(body).slice(0, 200)}`).toBe(
            before,
          );
        } else if (c.name !== "create a production") {
          expect(after).toBeGreaterThan(before);
        }
      }
      // The generator reaches both sides: some bodies are refused, and the run is not all one answer.
      expect([...statuses.keys()].some((st) => st >= 400)).toBe(true);
      expect((await fetch(`${BASE_URL}/api/health`)).status).toBe(200);
    }, 240_000);
  }
});
