// The plot's fixtures on the wire: one short array per fixture with only what the editor draws and
// edits, positions rounded to millimetres. The browser rebuilds each fixture's geometry with the same
// pure module the server uses, so the page no longer embeds ~2 MB of precomputed pools at 1,500 units.
import { computeFixtureGeometry } from "@/lib/rig/fixture-geometry";
import type { FixtureDto, FixtureRecord } from "@/lib/data/fixtures";
import type { PositionDto } from "@/lib/data/positions";
import type { FixtureTypeDto } from "@/lib/data/fixture-types";
import type { FocusPointDto } from "@/lib/data/focus-points";

/** The fields the plot keeps; everything else (notes, DMX, circuit …) is read from the fixture route. */
export const PLOT_FIXTURE_FIELDS = [
  "id", "positionId", "fixtureTypeId", "focusPointId", "unitNumber", "channel", "x", "y", "lensHeight",
  "focusX", "focusY", "aim", "coneDeg", "softnessDeg", "shutterCuts", "purpose", "colour", "version",
] as const;
type Field = (typeof PLOT_FIXTURE_FIELDS)[number];

export type PlotFixtureRecord = Pick<FixtureRecord, Field>;
export type PlotFixture = PlotFixtureRecord & Pick<FixtureDto, "positionName" | "typeName" | "family" | "focusPointName" | "computed">;
export type PlotFixtureWire = unknown[];

const LENGTHS = new Set<Field>(["x", "y", "lensHeight", "focusX", "focusY"]);
const mm = (v: number) => Math.round(v * 1000) / 1000;

export function toPlotFixtureWire(f: PlotFixtureRecord): PlotFixtureWire {
  return PLOT_FIXTURE_FIELDS.map((k) => {
    const v = f[k];
    return LENGTHS.has(k) && typeof v === "number" ? mm(v) : v;
  });
}

export function fromPlotFixtureWire(w: PlotFixtureWire): PlotFixtureRecord {
  const out: Record<string, unknown> = {};
  PLOT_FIXTURE_FIELDS.forEach((k, i) => (out[k] = w[i] ?? null));
  return out as PlotFixtureRecord;
}

type Related = { positions: PositionDto[]; fixtureTypes: FixtureTypeDto[]; focusPoints: FocusPointDto[] };

/** Names and geometry for every record; fixtures whose position or type is missing are left out. */
export function expandPlotFixtures(records: PlotFixtureRecord[], rel: Related, headHeight: number): PlotFixture[] {
  const positions = new Map(rel.positions.map((p) => [p.id, p]));
  const types = new Map(rel.fixtureTypes.map((t) => [t.id, t]));
  const points = new Map(rel.focusPoints.map((p) => [p.id, p]));
  const out: PlotFixture[] = [];
  for (const r of records) {
    const position = positions.get(r.positionId);
    const type = types.get(r.fixtureTypeId);
    if (!position || !type) continue;
    const point = r.focusPointId ? points.get(r.focusPointId) ?? null : null;
    out.push({
      ...r,
      positionName: position.name,
      typeName: type.name,
      family: type.family,
      focusPointName: point?.name ?? null,
      computed: computeFixtureGeometry({ ...r, focusPoint: point, position, type }, headHeight),
    });
  }
  return out;
}
