// The plot's fixtures on the wire: one short array per fixture with only what the editor draws and
// edits, positions rounded to millimetres. The browser rebuilds each fixture's geometry with the same
// pure module the server uses, so the page no longer embeds ~2 MB of precomputed pools at 1,500 units.
import { fixtureJoiner, joinFixtures } from "@/lib/rig/fixture-join";
import type { FixtureJoined, FixtureRecord } from "@/lib/dto/fixture";
import type { FixtureTypeDto } from "@/lib/dto/fixture-type";
import type { FocusPointDto, PositionDto } from "@/lib/dto/plan";

/** The fields the plot keeps; everything else (notes, DMX, circuit …) is read from the fixture route. */
export const PLOT_FIXTURE_FIELDS = [
  "id",
  "positionId",
  "fixtureTypeId",
  "focusPointId",
  "unitNumber",
  "channel",
  "x",
  "y",
  "lensHeight",
  "focusX",
  "focusY",
  "aim",
  "coneDeg",
  "softnessDeg",
  "shutterCuts",
  "purpose",
  "colour",
  "version",
] as const;
type Field = (typeof PLOT_FIXTURE_FIELDS)[number];

export type PlotFixtureRecord = Pick<FixtureRecord, Field>;
export type PlotFixture = PlotFixtureRecord & FixtureJoined;
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

/** Names and geometry for every record (the API's own join); fixtures whose position or type is missing are left out. */
export function expandPlotFixtures(records: PlotFixtureRecord[], rel: Related, headHeight: number): PlotFixture[] {
  return joinFixtures(
    records,
    fixtureJoiner({ positions: rel.positions, types: rel.fixtureTypes, points: rel.focusPoints }, headHeight),
  );
}
