import "server-only";
// Reads for the coverage and shadow studies: the rig reduced to what lights the stage, the chosen state's
// levels, the colour list, the acting areas, the performers and the scenery. Plain rows throughout: a
// 1,500-unit show is read in a few queries without building model instances.
import { getDb } from "@/models";
import { AppError, notFound } from "@/lib/errors";
import { computeTracking } from "@/lib/cues/tracking";
import type { CoverageRequest, LightSource } from "@/lib/validation/studies";
import { computeCoverage, stageBounds } from "@/lib/studies/coverage";
import type { StudyFixture, Levels } from "@/lib/studies/lights";
import { JOIN_POSITION_KEYS, JOIN_TYPE_KEYS } from "@/lib/rig/fixture-join";
import { getCuesByProduction } from "./cue-reads";
import { getAreaZonesByProduction } from "./area-zones";

export type StudyProduction = {
  id: number;
  displayUnits: "metric" | "imperial";
  headHeight: number;
  faceHeight: number;
  showDeckHeight: number;
  backWallY: number;
  stageWidth: number;
  stageDepth: number;
  apronDepth: number;
  prosceniumWidth: number;
};

export async function getStudyProduction({ productionId }: { productionId: number }): Promise<StudyProduction> {
  const row = (await getDb().Production.findOne({
    where: { id: productionId },
    attributes: [
      "id",
      "displayUnits",
      "headHeight",
      "faceHeight",
      "showDeckHeight",
      "backWallY",
      "stageWidth",
      "stageDepth",
      "apronDepth",
      "prosceniumWidth",
    ],
    raw: true,
  })) as unknown as StudyProduction | null;
  if (!row) throw notFound("Production");
  return row;
}

type FixtureRow = {
  id: number;
  unitNumber: string;
  positionId: number;
  fixtureTypeId: number;
  focusPointId: number | null;
  channel: number | null;
  colour: string | null;
  x: number;
  y: number;
  lensHeight: number | null;
  focusX: number | null;
  focusY: number | null;
  aim: "deck" | "head";
  coneDeg: number | null;
  softnessDeg: number | null;
};

/** Every unit of the production with its position's trim, its type's optics and its focus mark resolved. */
export async function getStudyFixtures({ productionId }: { productionId: number }): Promise<StudyFixture[]> {
  const { Fixture, Position, FixtureType, FocusPoint } = getDb();
  const [fixtures, positions, types, points] = await Promise.all([
    Fixture.findAll({
      where: { productionId },
      attributes: [
        "id",
        "unitNumber",
        "positionId",
        "fixtureTypeId",
        "focusPointId",
        "channel",
        "colour",
        "x",
        "y",
        "lensHeight",
        "focusX",
        "focusY",
        "aim",
        "coneDeg",
        "softnessDeg",
      ],
      order: [
        ["positionId", "ASC"],
        ["unitSort", "ASC"],
        ["cell", "ASC"],
      ],
      raw: true,
    }) as unknown as Promise<FixtureRow[]>,
    Position.findAll({ where: { productionId }, attributes: [...JOIN_POSITION_KEYS], raw: true }),
    FixtureType.findAll({
      where: { productionId },
      // What the pool needs, and what the light levels need on top.
      attributes: [...JOIN_TYPE_KEYS, "lensApertureM", "peakCandela", "peakCandelaNarrow"],
      raw: true,
    }),
    FocusPoint.findAll({ where: { productionId }, attributes: ["id", "x", "y"], raw: true }),
  ]);
  const pos = new Map(positions.map((p) => [p.id, p]));
  const typ = new Map(types.map((t) => [t.id, t]));
  const pts = new Map(points.map((p) => [p.id, p]));
  const out: StudyFixture[] = [];
  for (const f of fixtures) {
    const p = pos.get(f.positionId);
    const t = typ.get(f.fixtureTypeId);
    if (!p || !t) continue;
    const point = f.focusPointId != null ? pts.get(f.focusPointId) : undefined;
    const focus = point
      ? { x: point.x, y: point.y }
      : f.focusX != null && f.focusY != null
        ? { x: f.focusX, y: f.focusY }
        : null;
    out.push({
      id: f.id,
      unitNumber: f.unitNumber,
      positionName: p.name,
      channel: f.channel,
      colour: f.colour,
      x: f.x,
      y: f.y,
      lensHeight: f.lensHeight,
      trimHeight: p.trimHeight,
      focus,
      aim: f.aim,
      coneDeg: f.coneDeg,
      softnessDeg: f.softnessDeg,
      type: {
        family: t.family,
        coneMaxDeg: t.coneMaxDeg,
        defaultSoftnessDeg: t.defaultSoftnessDeg,
        lensDropM: t.lensDropM,
        mounting: t.mounting,
        lensRiseM: t.lensRiseM,
        lensApertureM: t.lensApertureM,
        peakCandela: t.peakCandela,
        coneMinDeg: t.coneMinDeg,
        peakCandelaNarrow: t.peakCandelaNarrow,
      },
    });
  }
  return out;
}

/** Channel levels (0–100) of the chosen light: a cue's tracked state, all at full, or hand-picked channels. */
export async function getStudyLevels({
  productionId,
  source,
}: {
  productionId: number;
  source: LightSource;
}): Promise<{ levels: Levels; label: string }> {
  if (source.kind === "full") return { levels: "full", label: "All units at full" };
  if (source.kind === "channels") {
    const m = new Map(Object.entries(source.levels).map(([ch, lv]) => [Number(ch), lv]));
    return { levels: m, label: `${m.size} chosen channel${m.size === 1 ? "" : "s"}` };
  }
  const cues = await getCuesByProduction({ productionId });
  const show = computeTracking(cues);
  const index = show.cueIds.indexOf(source.cueId);
  if (index < 0)
    throw new AppError("not_found", "That cue was not found in this production.", {
      fieldErrors: { "source.cueId": ["no such cue"] },
    });
  const levels = new Map<number, number>();
  show.states[index].forEach((lv, col) => {
    if (lv > 0) levels.set(show.channels[col], lv);
  });
  const cue = cues.find((c) => c.id === source.cueId)!;
  return { levels, label: `Cue ${cue.number}${cue.label ? ` (${cue.label})` : ""}` };
}

export async function getColourList({ productionId }: { productionId: number }): Promise<Map<string, number>> {
  const rows = await getDb().ColourTransmission.findAll({
    where: { productionId },
    attributes: ["name", "percent"],
    raw: true,
  });
  return new Map(rows.map((r) => [r.name, r.percent]));
}

/** Reads everything a coverage study needs and computes it: the one path for the grid route and the exports. */
export async function runCoverageStudy({ productionId, request }: { productionId: number; request: CoverageRequest }) {
  const [production, fixtures, state, colours, zones] = await Promise.all([
    getStudyProduction({ productionId }),
    getStudyFixtures({ productionId }),
    getStudyLevels({ productionId, source: request.source }),
    getColourList({ productionId }),
    getAreaZonesByProduction({ productionId }),
  ]);
  const result = computeCoverage(request, {
    fixtures,
    levels: state.levels,
    colours,
    areas: zones.map((z) => ({ id: z.id, name: z.name, polygon: z.polygon })),
    headHeight: production.headHeight,
    faceHeight: production.faceHeight,
    deckHeight: production.showDeckHeight,
    bounds: stageBounds(production),
  });
  return { ...result, stateLabel: state.label, displayUnits: production.displayUnits };
}
