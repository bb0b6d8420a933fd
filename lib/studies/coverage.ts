// The coverage study for one state, from plain inputs to the reply the page draws: the grid over the
// stage, the acting areas' table and the legend's facts. Pure; the route handler supplies the rows.
import { areaCoverage, coverageGrid, type AreaInput, type Bounds, type Measure } from "@/lib/optics";
import type { CoverageResult, GridWire } from "@/lib/dto/studies";
import type { CoverageRequest } from "@/lib/validation/studies";
import { studyLights, type Levels, type StudyFixture } from "./lights";
import { typedToBase64 } from "./wire";

export type StageSize = { stageWidth: number; stageDepth: number; apronDepth: number; backWallY: number };

/** The grid covers the stage: wing to wing, from the apron's edge to the back wall (or the stage's depth). */
export function stageBounds(s: StageSize): Bounds {
  const depth = Math.max(s.stageDepth, Number.isFinite(s.backWallY) ? s.backWallY : 0);
  return { minX: -s.stageWidth / 2, maxX: s.stageWidth / 2, minY: -s.apronDepth, maxY: depth };
}

export type CoverageScene = {
  fixtures: StudyFixture[];
  levels: Levels;
  colours: ReadonlyMap<string, number>;
  areas: AreaInput[];
  headHeight: number;
  faceHeight: number;
  deckHeight: number;
  bounds: Bounds;
};

function measureOf(r: CoverageRequest["measure"], s: CoverageScene): Measure {
  if (r.kind === "deck") return { kind: "deck" };
  if (r.kind === "head") return { kind: "plane", height: s.headHeight };
  return { kind: "face", height: s.faceHeight, facingDeg: r.facingDeg };
}

export function computeCoverage(req: CoverageRequest, s: CoverageScene): CoverageResult {
  const { lights, beams, warnings } = studyLights(s.fixtures, s.levels, {
    headHeight: s.headHeight,
    deckHeight: s.deckHeight,
    colours: s.colours,
  });
  const measure = measureOf(req.measure, s);
  const t0 = performance.now();
  const g = coverageGrid({ bounds: s.bounds, resolution: req.resolution, deckHeight: s.deckHeight, measure, beams });
  const computeMs = performance.now() - t0;
  const areas = areaCoverage(g, s.areas, { minUniformity: req.minUniformity, meanRatio: req.meanRatio });
  const grid: GridWire = {
    cols: g.cols,
    rows: g.rows,
    resolution: g.resolution,
    originX: g.originX,
    originY: g.originY,
    min: g.min,
    mean: g.mean,
    max: g.max,
    values: typedToBase64(g.values),
    ...(g.key && g.keyLux ? { key: typedToBase64(g.key), keyLux: typedToBase64(g.keyLux) } : {}),
  };
  if (!lights.length) warnings.unshift("Nothing is lit in this state.");
  return {
    measure: {
      kind: req.measure.kind,
      planeHeight: measure.kind === "deck" ? 0 : measure.height,
      facingDeg: measure.kind === "face" ? measure.facingDeg : null,
    },
    deckHeight: s.deckHeight,
    grid,
    areas,
    lights,
    curves: [...new Set(lights.map((l) => l.curve))].sort(),
    warnings,
    computeMs,
  };
}
