import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import * as fromModels from "@/models/position-kinds";
import { POINT_HUNG_KINDS, POSITION_KINDS, POSITION_KIND_LABELS, isPointHung } from "@/lib/rig/position-kinds";
import { ROLES as MODEL_ROLES } from "@/models/roles";
import { ROLES } from "@/lib/auth/roles";

const root = path.resolve(__dirname, "../../..");
const read = (file: string) => readFileSync(path.join(root, file), "utf8");

describe("point-hung position kinds", () => {
  it("puts upright and single-point positions at a point", () => {
    // common practice, no source: a boom (or box boom) is an upright pipe on a base or in a house-wall box,
    // a ladder hangs as an upright frame, a pipe end carries side units dropped one under another at the tip
    // of an electric, and a floor position is a base or stand on the deck.
    for (const kind of ["boom", "box-boom", "ladder", "pipe-end", "floor"]) expect(isPointHung(kind), kind).toBe(true);
  });

  it("spreads units along pipes, electrics, trusses, bridges and rails", () => {
    // common practice, no source: these are hung between two ends and units are clamped along them.
    for (const kind of ["overhead-pipe", "flying-electric", "truss", "foh-bridge", "foh-rail"])
      expect(isPointHung(kind), kind).toBe(false);
  });

  it("classifies every kind, and nothing else", () => {
    for (const kind of POINT_HUNG_KINDS) expect(POSITION_KINDS).toContain(kind);
    expect(isPointHung("")).toBe(false);
    expect(isPointHung(null)).toBe(false);
    expect(isPointHung("Boom")).toBe(false); // kinds are stored lower-case; a display label is not a kind
    expect(Object.keys(POSITION_KIND_LABELS).sort()).toEqual([...POSITION_KINDS].sort());
  });

  it("is one list: lib re-exports the models' list rather than keeping its own", () => {
    expect(POSITION_KINDS).toBe(fromModels.POSITION_KINDS);
    expect(POINT_HUNG_KINDS).toBe(fromModels.POINT_HUNG_KINDS);
    expect(ROLES).toBe(MODEL_ROLES);
  });

  it("matches the database enums the migrations create", () => {
    const migration = read("migrations/20261202000100-foundation.cjs");
    const enumAfter = (label: RegExp) => {
      const m = migration.match(new RegExp(`${label.source}[\\s\\S]{0,80}?S\\.ENUM\\(([^)]*)\\)`));
      return m ? [...m[1].matchAll(/"([^"]+)"/g)].map((x) => x[1]) : null;
    };
    expect(enumAfter(/kind: \{\s*/)).toEqual([...POSITION_KINDS]);
    expect(enumAfter(/role: /)).toEqual([...ROLES]);
  });

  it("agrees with the demo data: exactly the point-hung positions have no second end", () => {
    const seeder = read("seeders/20261202000100-demo-production.cjs");
    const rows = [...seeder.matchAll(/\["[^"]+", "([a-z-]+)", -?[\d.]+, -?[\d.]+, (null|-?[\d.]+), (null|-?[\d.]+),/g)];
    expect(rows.length).toBeGreaterThan(5);
    for (const [, kind, x2, y2] of rows) expect(x2 === "null" && y2 === "null", kind).toBe(isPointHung(kind));
  });
});
