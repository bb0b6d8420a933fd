// npm run bench:plot-payload — size of the plot's fixtures on the wire (full rows with server geometry vs
// the slim arrays the editor now reads) and the browser's cost of rebuilding names and geometry.
// Pure code on invented rigs (40 positions, 4 types); independent of machine load apart from the timing.
import { performance } from "node:perf_hooks";
import { computeFixtureGeometry } from "@/lib/rig/fixture-geometry";
import {
  expandPlotFixtures,
  fromPlotFixtureWire,
  toPlotFixtureWire,
  type PlotFixtureRecord,
} from "@/lib/plot/slim-fixtures";
import type { PositionDto } from "@/lib/dto/plan";
import type { FixtureTypeDto } from "@/lib/dto/fixture-type";

const positions = Array.from(
  { length: 40 },
  (_, i) =>
    ({ id: i + 1, name: `Pipe ${i + 1}`, kind: "pipe", trimHeight: 6 + (i % 5) * 0.5 }) as unknown as PositionDto,
);
const fixtureTypes = [10, 19, 26, 36].map(
  (cone, i) =>
    ({
      id: 100 + i,
      name: `Type ${cone}`,
      family: "profile",
      coneMinDeg: cone,
      coneMaxDeg: cone,
      defaultSoftnessDeg: 3,
      lensDropM: 0.4,
    }) as unknown as FixtureTypeDto,
);
// Every other field of a full row, at a typical length (notes, DMX, circuit …), for the "before" size.
const REST = {
  productionId: 1,
  bodyKey: null,
  cell: null,
  universe: 1,
  address: 101,
  dmxMode: "16-bit",
  footprint: 4,
  circuit: "A12",
  dimmer: "212",
  gobo: null,
  irisPercent: null,
  notes: "check the safety",
  focusNotes: null,
  hung: true,
  focused: false,
  focusedAt: null,
  focusedBy: null,
  updatedAt: "2026-12-02T14:00:00.000Z",
};

function rig(n: number): PlotFixtureRecord[] {
  return Array.from({ length: n }, (_, i) => ({
    id: i + 1,
    positionId: (i % 40) + 1,
    fixtureTypeId: 100 + (i % 4),
    focusPointId: null,
    unitNumber: String(Math.floor(i / 40) + 1),
    channel: i + 1,
    x: -8 + (i % 37) * 0.4371,
    y: -6 + (i % 40) * 0.7719,
    lensHeight: null,
    focusX: Math.sin(i) * 5,
    focusY: Math.cos(i) * 4,
    aim: i % 3 ? "deck" : "head",
    coneDeg: null,
    softnessDeg: null,
    shutterCuts: null,
    purpose: "front wash",
    colour: "pale blue",
    version: 1,
  }));
}

const rows: string[] = [];
for (const n of (process.env.BENCH_SIZES ?? "100,1500,5000").split(",").map(Number)) {
  const records = rig(n);
  const full = records.map((r) => ({
    ...r,
    ...REST,
    positionName: "Pipe",
    typeName: "Type",
    family: "profile",
    focusPointName: null,
    computed: computeFixtureGeometry(
      { ...r, focusPoint: null, position: positions[r.positionId - 1], type: fixtureTypes[r.fixtureTypeId - 100] },
      1.7,
    ),
  }));
  const fullBytes = JSON.stringify(full).length;
  const wire = JSON.stringify(records.map(toPlotFixtureWire));
  const times: number[] = [];
  for (let k = 0; k < 9; k++) {
    const t0 = performance.now();
    expandPlotFixtures(
      (JSON.parse(wire) as unknown[][]).map(fromPlotFixtureWire),
      { positions, fixtureTypes, focusPoints: [] },
      1.7,
    );
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  rows.push(
    `| ${n.toLocaleString("en")} | ${(fullBytes / 1024).toFixed(0)} KB | ${(wire.length / 1024).toFixed(0)} KB | ${times[4].toFixed(1)} ms |`,
  );
}
console.log(
  [
    "| fixtures | full rows (before) | slim arrays (now) | parse + rebuild in the browser, median of 9 |",
    "|---|---|---|---|",
    ...rows,
  ].join("\n"),
);
