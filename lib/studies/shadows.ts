// The shadow study for one state: every lit unit against every performer and scenery panel, on the show
// deck. The deck is the plane z = 0 of lib/optics's shadow model, so lens heights are taken from it.
import { type Occluder, type Shadow, type ShadowPolygons, shadowOf, shadowPolygonsOf, type Vec3 } from "@/lib/optics";
import type { FixtureShadow, OccluderShadows, PerformerMarkDto, ScenicPanelDto, StudyLight } from "@/lib/dto/studies";

export type ShadowScene = {
  lights: StudyLight[];
  performers: Pick<PerformerMarkDto, "id" | "name" | "x" | "y" | "height" | "shoulderWidth">[];
  panels: Pick<ScenicPanelDto, "id" | "name" | "x1" | "y1" | "x2" | "y2" | "height">[];
  backWallY: number;
  deckHeight: number;
  /**
   * Outlines cost nearly all of the time (a hull per lens sample, then their overlap): with 16 sides and 8
   * lens samples about 55 µs a pair of CPU at load ~22 against under 1 µs for the numbers, measured by
   * bench/studies.ts (see docs/benchmarks.md). The numbers never depend on these settings; the live preview
   * while dragging draws coarser outlines.
   */
  outlines?: { sides: number; lensSamples: number } | false;
};

/** A lit unit with its lens measured from the show deck, worked out once for all the occluders. */
type DeckLight = { light: StudyLight; source: Vec3 };

/**
 * The row for one unit and one occluder. Written as one literal, no object spread: built 4,000 times for a
 * big show, the spread (lowered to helper calls by the TypeScript transform) took 40 µs a row against 0.3 µs
 * (bench/studies.ts, profiled).
 */
function row(light: StudyLight, sh: Omit<Shadow, "tip" | "incidenceDeg">, poly: ShadowPolygons): FixtureShadow {
  return {
    fixtureId: light.fixtureId,
    unitLabel: light.unitLabel,
    lands: sh.lands,
    reason: sh.reason ?? null,
    length: sh.length,
    wallHeight: sh.wallHeight,
    penumbraWidth: sh.penumbraWidth,
    umbraWidth: sh.umbraWidth,
    umbra: poly.umbra,
    penumbra: poly.penumbra,
  };
}

function nothing(light: StudyLight, reason: string): FixtureShadow {
  const sh = { lands: "none" as const, reason, length: null, wallHeight: null, penumbraWidth: null, umbraWidth: null };
  return row(light, sh, { umbra: [], penumbra: [] });
}

function shadowFor({ light, source }: DeckLight, occluder: Occluder, s: ShadowScene): FixtureShadow {
  if (source.z <= 0) return nothing(light, "The lens is at or below the show deck.");
  const input = { source, apertureDiameter: light.apertureDiameter, backWallY: s.backWallY, occluder };
  try {
    const sh = shadowOf(input);
    const poly =
      s.outlines === false
        ? { umbra: [], penumbra: [] }
        : shadowPolygonsOf(input, sh, s.outlines ?? { sides: 16, lensSamples: 8 });
    return row(light, sh, poly);
  } catch (err) {
    // A lens behind the back wall, or an occluder standing in it: said in words, not a failed study.
    return nothing(light, err instanceof RangeError ? err.message : "This shadow could not be computed.");
  }
}

export function shadowStudy(s: ShadowScene): OccluderShadows[] {
  const out: OccluderShadows[] = [];
  const lights: DeckLight[] = s.lights.map((light) => ({
    light,
    source: { x: light.source.x, y: light.source.y, z: light.source.z - s.deckHeight },
  }));
  for (const p of s.performers) {
    const occ: Occluder = { kind: "performer", x: p.x, y: p.y, height: p.height, radius: p.shoulderWidth / 2 };
    out.push({ kind: "performer", id: p.id, name: p.name, shadows: lights.map((l) => shadowFor(l, occ, s)) });
  }
  for (const p of s.panels) {
    const occ: Occluder = { kind: "panel", a: { x: p.x1, y: p.y1 }, b: { x: p.x2, y: p.y2 }, height: p.height };
    out.push({ kind: "panel", id: p.id, name: p.name, shadows: lights.map((l) => shadowFor(l, occ, s)) });
  }
  return out;
}
