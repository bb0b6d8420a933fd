// The focus chart of one fixture: every value the crew needs, already in the production's units and in
// deck words, so the screen, the printed page, the PDF and the Excel sheet all say the same thing.
import type { FixtureDto } from "@/lib/dto/fixture";
import {
  describeBeam,
  describePoint,
  edgeWord,
  formatLength,
  profileShapeOf,
  type Family,
  type PlanePool,
  type Point,
  type Units,
} from "@/lib/optics";
import { mergeLandmarks, outlineLandmarks, type Landmark, type StageDimensions } from "./landmarks";
import { readCut, type CutReading } from "./shutters";
import { barnDoorWords, formatStamp, goboRotationWords, offsetFromMark } from "./words";

export type ChartProduction = StageDimensions & { name: string; displayUnits: Units; headHeight: number };
/** What a unit's accessories add to its chart (their names, a barn-door or gobo note) where its own fields are empty. */
export type ChartExtras = { accessories?: string[]; barnDoors?: string | null; goboOrientation?: string | null };

export type ChartRow = { key: string; label: string; value: string };
/** The focus photo taken on the deck: a small copy for the chart, the full copy behind a link. */
export type ChartPhoto = { uploadId: number; thumbSrc: string; href: string };

export type FocusChart = {
  id: number;
  positionId: number;
  positionName: string;
  unitNumber: string;
  channel: number | null;
  focusPointId: number | null;
  mark: Point | null;
  version: number;
  focused: boolean;
  focusedLine: string;
  identity: ChartRow[];
  focus: ChartRow[];
  beam: ChartRow[];
  cuts: CutReading[];
  notes: string | null;
  focusNotes: string | null;
  photo: ChartPhoto | null;
  warnings: string[];
  fixture: FixtureDto;
};

const row = (key: string, label: string, value: string | null | undefined): ChartRow => ({
  key,
  label,
  value: value?.trim() ? value : "—",
});

function familyShape(family: string): "flat" | "peaked" | null {
  try {
    return profileShapeOf(family as Family);
  } catch {
    return null;
  }
}

function poolWords(pool: PlanePool | null, mark: Point | null, units: Units): string {
  if (!pool) return "—";
  if (pool.status !== "ok" || !pool.outer) return pool.reason ?? "no pool";
  const size = `${formatLength(pool.lengthAlong!, units)} along × ${formatLength(pool.widthAcross!, units)} across`;
  return mark ? `${size}; centre ${offsetFromMark(pool.outer.centre, mark, units)}` : size;
}

/** Distance from the mark to the outer pool's farthest edge on the deck; undefined without a closed pool. */
function poolReach(pool: PlanePool | null, mark: Point): number | undefined {
  if (pool?.status !== "ok" || !pool.outer) return undefined;
  const c = pool.outer.centre;
  return Math.hypot(c.x - mark.x, c.y - mark.y) + pool.outer.semiMajor;
}

function bandWords(pool: PlanePool | null, units: Units): string {
  if (!pool?.band) return "—";
  const f = (v: number) => formatLength(v, units);
  return `near ${f(pool.band.near)}, far ${f(pool.band.far)}, across ${f(pool.band.across)}`;
}

function hotSpotWords(f: FixtureDto, mark: Point, units: Units, shape: "flat" | "peaked" | null): string {
  const at = f.aim === "head" ? "at head height" : "on the deck";
  const lead =
    shape === "flat" ? `Flat field, even across the core; axis on the mark ${at}` : `Brightest on the mark ${at}`;
  const hit = f.aim === "head" ? f.computed.deck?.axisHit : null;
  return hit ? `${lead}; axis reaches the deck ${offsetFromMark(hit, mark, units)}` : lead;
}

export function buildFocusChart(
  f: FixtureDto,
  p: ChartProduction,
  o: {
    landmarks?: Landmark[] | null;
    userNames?: Record<number, string>;
    timeZone?: string;
    extras?: ChartExtras;
  } = {},
): FocusChart {
  const units = p.displayUnits;
  const len = (v: number | null | undefined) => (v == null ? null : formatLength(v, units));
  const g = f.computed;
  const mark: Point | null = g.focus ? { x: g.focus.x, y: g.focus.y } : null;
  const shape = familyShape(f.family);
  const landmarks = mergeLandmarks(o.landmarks, outlineLandmarks(p));
  const warnings = [...(g.deck?.warnings ?? [])];
  const deckWords = mark ? describePoint(mark, { units, datumName: p.datumName }) : null;

  const cuts: CutReading[] = [];
  for (const [i, cut] of (f.shutterCuts ?? []).entries()) {
    if (!mark) break;
    try {
      cuts.push(
        readCut(cut, {
          mark,
          panDeg: g.panDeg,
          tiltDeg: g.tiltDeg,
          family: f.family,
          landmarks,
          units,
          datumName: p.datumName,
          poolReach: poolReach(g.deck, mark),
        }),
      );
    } catch (err) {
      warnings.push(`Cut ${i + 1}: ${(err as Error).message}`);
    }
  }

  const address = f.address == null ? null : f.universe != null ? `${f.universe}/${f.address}` : String(f.address);
  const identity = [
    row("position", "Position", f.positionName),
    row("unit", "Unit", f.unitNumber + (f.cell != null ? ` cell ${f.cell}` : "")),
    row("channel", "Channel", f.channel?.toString()),
    row("address", "Address", address),
    row("circuit", "Circuit", [f.circuit, f.dimmer && `dimmer ${f.dimmer}`].filter(Boolean).join(", ")),
    row("type", "Type", f.typeName),
    row("colour", "Colour", f.colour),
    row("gobo", "Gobo", f.gobo),
    row(
      "accessories",
      "Accessories",
      o.extras?.accessories?.length ? o.extras.accessories.join(", ") : "none recorded",
    ),
    row("purpose", "Purpose", f.purpose),
  ];
  const focus = [
    row(
      "mark",
      "Focus mark",
      mark ? (f.focusPointName ? `${f.focusPointName}: ${deckWords}` : deckWords) : "no mark set",
    ),
    row("aimHeight", "Aim height", f.aim === "head" ? `head height (${len(p.headHeight)})` : "deck"),
    row("hotSpot", "Hot spot", mark ? hotSpotWords(f, mark, units, shape) : null),
    row("throw", "Throw", len(g.throw)),
    row("lightFrom", "Direction", g.focus ? describeBeam(g.source, g.focus) : null),
    row("lens", "Lens at", `${describePoint(g.source, { units, datumName: p.datumName })}, ${len(g.lensHeight)} up`),
    row("deckPool", "Pool at deck", poolWords(g.deck, mark, units)),
    row("headPool", "Pool at head height", poolWords(g.head, mark, units)),
    row("deckBand", "Soft band at deck", bandWords(g.deck, units)),
    row("headBand", "Soft band at head", bandWords(g.head, units)),
  ];
  const beam = beamRows(f, { shape, barnDoors: barnDoorsValue(f, o.extras, cuts), gobo: goboValue(f, o.extras) });
  const who = f.focusedBy != null ? (o.userNames?.[f.focusedBy] ?? "a former team member") : null;
  const focusedLine = f.focused
    ? `Focused${f.focusedAt ? ` ${formatStamp(f.focusedAt, o.timeZone)}` : ""}${who ? ` by ${who}` : ""}`
    : "Not focused yet";

  return {
    id: f.id,
    positionId: f.positionId,
    positionName: f.positionName,
    unitNumber: f.unitNumber,
    channel: f.channel,
    focusPointId: f.focusPointId,
    mark,
    version: f.version,
    focused: f.focused,
    focusedLine,
    identity,
    focus,
    beam,
    cuts,
    notes: f.notes,
    focusNotes: f.focusNotes,
    photo: photoOf(f),
    warnings,
    fixture: f,
  };
}

/** Where the photo is served (members only); the upload id in the address changes when the photo does. */
export function photoOf(f: Pick<FixtureDto, "id" | "productionId" | "focusPhotoUploadId">): ChartPhoto | null {
  if (f.focusPhotoUploadId == null) return null;
  const base = `/api/productions/${f.productionId}/fixtures/${f.id}/photo?u=${f.focusPhotoUploadId}`;
  return { uploadId: f.focusPhotoUploadId, thumbSrc: `${base}&size=thumb`, href: base };
}

// The fixture's own fields first; an accessory's note or a barn-door cut drawn on the plot otherwise.
function barnDoorsValue(f: FixtureDto, extras: ChartExtras | undefined, cuts: CutReading[]): string {
  const own = barnDoorWords({
    top: f.barnDoorTop,
    bottom: f.barnDoorBottom,
    left: f.barnDoorLeft,
    right: f.barnDoorRight,
  });
  if (own) return own;
  return extras?.barnDoors ?? (cuts.some((c) => c.cutter === "barn door") ? "see cuts" : "none recorded");
}

function goboValue(f: FixtureDto, extras: ChartExtras | undefined): string {
  if (f.goboRotationDeg != null)
    return f.gobo ? goboRotationWords(f.goboRotationDeg) : `${goboRotationWords(f.goboRotationDeg)} (no gobo named)`;
  return f.gobo ? (extras?.goboOrientation ?? "not recorded") : "no gobo";
}

/**
 * The beam's rows follow what the unit has to set on the deck: a profile its edge (barrel), zoom (when its
 * lens zooms), iris and gobo; a fresnel or PC its spot/flood travel and barn doors; a PAR its lamp's
 * rotation; an LED or moving wash its zoom. A row a family has no control for is left off.
 */
function beamRows(f: FixtureDto, o: { shape: "flat" | "peaked" | null; barnDoors: string; gobo: string }): ChartRow[] {
  const g = f.computed;
  const zooms = g.coneRange.max > g.coneRange.min;
  const cone = `${round1(g.coneDeg)}° cone`;
  const field = row("field", "Field", o.shape ? (o.shape === "flat" ? "flat" : "peaked") : null);
  const zoom = zooms
    ? row("zoom", "Zoom", `${cone}, ${round1(g.softnessDeg)}° soft`)
    : row("cone", "Lens", `fixed, ${cone}`);
  const barnDoors = row("barnDoors", "Barn doors", o.barnDoors);
  switch (f.family) {
    case "profile":
    case "followspot":
      return [
        row("edge", "Edge", edgeWord(g.coneDeg, g.softnessDeg)),
        zoom,
        field,
        row("iris", "Iris", f.irisPercent == null ? "open" : `${round1(f.irisPercent)} %`),
        barnDoors,
        row("goboOrientation", "Gobo rotation", o.gobo),
      ];
    case "fresnel":
      return [row("spotFlood", "Spot/flood", spotFloodWords(g.coneDeg, g.coneRange)), field, barnDoors];
    case "par":
      // No stored field for the lamp's turn yet: the electrician records it in the as-focused notes.
      return [
        row("cone", "Lens", cone),
        field,
        row("lampRotation", "Lamp rotation", "not recorded (see as-focused notes)"),
        barnDoors,
      ];
    default:
      // LED and moving washes, cyc units and anything unknown: the cone (zoom where it zooms) and the field.
      return [zoom, field, barnDoors];
  }
}

/** Where a fresnel or PC sits in its travel, in the words used on the deck. */
export function spotFloodWords(coneDeg: number, range: { min: number; max: number }): string {
  const cone = `${round1(coneDeg)}° cone`;
  if (!(range.max > range.min)) return `fixed, ${cone}`;
  const t = (coneDeg - range.min) / (range.max - range.min);
  if (t <= 0.02) return `full spot, ${cone}`;
  if (t >= 0.98) return `full flood, ${cone}`;
  return `${Math.round(t * 100)} % toward flood, ${cone}`;
}

function round1(v: number): string {
  return (Math.round(v * 10) / 10).toString();
}
