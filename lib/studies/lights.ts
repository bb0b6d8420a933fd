// Which units give light in a study, and how much: the fixture's aim (lens from the stage floor, focus on
// the show deck), its level in the chosen state through its family's dimmer curve, times its colour's
// transmission. Pure, so the server and the browser build the same beams.
import {
  dimmerCurveOf,
  FIXTURE_FAMILIES,
  lightFromLevel,
  peakCandelaAt,
  transmissionOf,
  type ColourList,
  type Family,
  type LitBeam,
} from "@/lib/optics";
import type { StudyLight } from "@/lib/dto/studies";
import { defaultLensHeight } from "@/lib/rig/fixture-geometry";
import type { FixtureMounting } from "@/models/fixture-mountings";

export type StudyFixture = {
  id: number;
  unitNumber: string;
  positionName: string;
  channel: number | null;
  colour: string | null;
  x: number;
  y: number;
  lensHeight: number | null;
  trimHeight: number;
  focus: { x: number; y: number } | null;
  aim: "deck" | "head";
  coneDeg: number | null;
  softnessDeg: number | null;
  type: {
    family: string;
    coneMaxDeg: number;
    defaultSoftnessDeg: number;
    lensDropM: number;
    mounting?: FixtureMounting;
    lensRiseM?: number;
    lensApertureM: number;
    peakCandela: number;
    /** A zoom's range and its peak at the narrow end: the peak follows the zoom setting (lib/optics/zoom-peak.ts). */
    coneMinDeg?: number;
    peakCandelaNarrow?: number | null;
  };
};

/** Level 0–100 of a channel in the chosen state; "full" lights every unit, channel or not. */
export type Levels = "full" | ReadonlyMap<number, number>;

export type StudySetup = { headHeight: number; deckHeight: number; colours: ColourList };

const KNOWN = new Set<string>(FIXTURE_FAMILIES.map((f) => f.value));

function familyOf(f: string): Family {
  return (KNOWN.has(f) ? f : "profile") as Family;
}

export function levelOf(f: StudyFixture, levels: Levels): number {
  if (levels === "full") return 100;
  return f.channel == null ? 0 : (levels.get(f.channel) ?? 0);
}

/** The lit units with their beams (same order), and the warnings a designer should read. */
export function studyLights(
  fixtures: StudyFixture[],
  levels: Levels,
  s: StudySetup,
): { lights: StudyLight[]; beams: LitBeam[]; warnings: string[] } {
  const lights: StudyLight[] = [];
  const beams: LitBeam[] = [];
  const unaimed: string[] = [];
  const missing = new Set<string>();
  for (const f of fixtures) {
    const level = levelOf(f, levels);
    if (!(level > 0)) continue;
    const label = `${f.positionName} ${f.unitNumber}`;
    if (!f.focus) {
      unaimed.push(label);
      continue;
    }
    const family = familyOf(f.type.family);
    const curve = dimmerCurveOf(family);
    const t = transmissionOf(f.colour, s.colours);
    for (const m of t.missing) missing.add(m);
    const output = lightFromLevel(Math.min(1, level / 100), curve) * t.factor;
    const source = { x: f.x, y: f.y, z: f.lensHeight ?? defaultLensHeight(f.trimHeight, f.type) };
    const focus = { x: f.focus.x, y: f.focus.y, z: s.deckHeight + (f.aim === "head" ? s.headHeight : 0) };
    const coneDeg = f.coneDeg ?? f.type.coneMaxDeg;
    const softnessDeg = f.softnessDeg ?? f.type.defaultSoftnessDeg;
    lights.push({
      fixtureId: f.id,
      unitLabel: label,
      channel: f.channel,
      source,
      focus,
      coneDeg,
      softnessDeg,
      family,
      apertureDiameter: f.type.lensApertureM,
      peakCandela: f.type.peakCandela,
      level,
      output,
      curve,
      colour: f.colour,
      missingColours: t.missing,
    });
    const t0 = f.type;
    const peakCandela = peakCandelaAt(
      {
        coneMinDeg: t0.coneMinDeg ?? t0.coneMaxDeg,
        coneMaxDeg: t0.coneMaxDeg,
        peakCandela: t0.peakCandela,
        peakCandelaNarrow: t0.peakCandelaNarrow,
      },
      coneDeg,
    );
    beams.push({ source, focus, coneDeg, softnessDeg, peakCandela, level: output, family });
  }
  const warnings: string[] = [];
  if (missing.size) {
    warnings.push(
      `No transmission set for ${[...missing].map((m) => `"${m}"`).join(", ")}: counted at 100 %. Add them to the colour list.`,
    );
  }
  if (unaimed.length) {
    warnings.push(
      `${unaimed.length} lit unit${unaimed.length === 1 ? " has" : "s have"} no focus mark and ${unaimed.length === 1 ? "is" : "are"} left out: ${unaimed.slice(0, 8).join(", ")}${unaimed.length > 8 ? " …" : ""}.`,
    );
  }
  return { lights, beams, warnings };
}
