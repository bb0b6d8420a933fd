// The shadow study for one state: every lit unit against every performer and scenery panel, on the show
// deck. The deck is the plane z = 0 of lib/optics's shadow model, so lens heights are taken from it.
import { shadowOf, shadowPolygons, type Occluder } from "@/lib/optics";
import type { FixtureShadow, OccluderShadows, PerformerMarkDto, ScenicPanelDto, StudyLight } from "@/lib/dto/studies";

export type ShadowScene = {
  lights: StudyLight[];
  performers: Pick<PerformerMarkDto, "id" | "name" | "x" | "y" | "height" | "shoulderWidth">[];
  panels: Pick<ScenicPanelDto, "id" | "name" | "x1" | "y1" | "x2" | "y2" | "height">[];
  backWallY: number;
  deckHeight: number;
  /**
   * Outlines cost nearly all of the time (a hull per lens sample, then their intersection): about 0.2 ms a
   * pair with 16 sides and 8 lens samples against 0.005 ms for the numbers, measured by bench/studies.ts.
   * The numbers never depend on these settings; the live preview while dragging draws coarser outlines.
   */
  outlines?: { sides: number; lensSamples: number } | false;
};

function shadowFor(light: StudyLight, occluder: Occluder, s: ShadowScene): FixtureShadow {
  const source = { ...light.source, z: light.source.z - s.deckHeight };
  const base = { fixtureId: light.fixtureId, unitLabel: light.unitLabel };
  if (source.z <= 0) {
    return {
      ...base,
      lands: "none",
      reason: "The lens is at or below the show deck.",
      length: null,
      wallHeight: null,
      penumbraWidth: null,
      umbraWidth: null,
      umbra: [],
      penumbra: [],
    };
  }
  const input = { source, apertureDiameter: light.apertureDiameter, backWallY: s.backWallY, occluder };
  try {
    const sh = shadowOf(input);
    const poly =
      s.outlines === false
        ? { umbra: [], penumbra: [] }
        : shadowPolygons(input, s.outlines ?? { sides: 16, lensSamples: 8 });
    return {
      ...base,
      lands: sh.lands,
      reason: sh.reason ?? null,
      length: sh.length,
      wallHeight: sh.wallHeight,
      penumbraWidth: sh.penumbraWidth,
      umbraWidth: sh.umbraWidth,
      umbra: poly.umbra,
      penumbra: poly.penumbra,
    };
  } catch (err) {
    // A lens behind the back wall, or an occluder standing in it: said in words, not a failed study.
    const reason = err instanceof RangeError ? err.message : "This shadow could not be computed.";
    return {
      ...base,
      lands: "none",
      reason,
      length: null,
      wallHeight: null,
      penumbraWidth: null,
      umbraWidth: null,
      umbra: [],
      penumbra: [],
    };
  }
}

export function shadowStudy(s: ShadowScene): OccluderShadows[] {
  const out: OccluderShadows[] = [];
  for (const p of s.performers) {
    const occ: Occluder = { kind: "performer", x: p.x, y: p.y, height: p.height, radius: p.shoulderWidth / 2 };
    out.push({ kind: "performer", id: p.id, name: p.name, shadows: s.lights.map((l) => shadowFor(l, occ, s)) });
  }
  for (const p of s.panels) {
    const occ: Occluder = { kind: "panel", a: { x: p.x1, y: p.y1 }, b: { x: p.x2, y: p.y2 }, height: p.height };
    out.push({ kind: "panel", id: p.id, name: p.name, shadows: s.lights.map((l) => shadowFor(l, occ, s)) });
  }
  return out;
}
