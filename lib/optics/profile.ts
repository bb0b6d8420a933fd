import { beamAngles, type BeamAngles } from "./validate";
import { DEG } from "./vector";

export type Family = "profile" | "fresnel" | "wash" | "par" | "led-wash" | "cyc" | "followspot";
/** flat: full core with a cosine fade (the design's profile-spot model); peaked: falls from the axis. */
export type ProfileShape = "flat" | "peaked";

export const FIXTURE_FAMILIES: ReadonlyArray<{ value: Family; label: string; shape: ProfileShape }> = [
  { value: "profile", label: "Profile spot", shape: "flat" },
  { value: "fresnel", label: "Fresnel", shape: "peaked" },
  { value: "wash", label: "Wash light", shape: "peaked" },
  { value: "par", label: "PAR can", shape: "peaked" },
  { value: "led-wash", label: "LED wash", shape: "peaked" },
  { value: "cyc", label: "Cyc or batten flood", shape: "peaked" },
  { value: "followspot", label: "Followspot", shape: "flat" },
];

const SHAPES: Record<Family, ProfileShape> = Object.fromEntries(
  FIXTURE_FAMILIES.map((f) => [f.value, f.shape]),
) as Record<Family, ProfileShape>;

export function profileShapeOf(family: Family): ProfileShape {
  const shape = SHAPES[family];
  if (!shape) throw new RangeError(`Unknown fixture family "${String(family)}".`);
  return shape;
}

/** ln(ln 10 / ln 2): makes the peaked curve, which is ½ at the beam half-angle, equal 1/10 at the field one. */
const LOG_TEN_OVER_HALF = Math.log(Math.log(10) / Math.log(2));

/** Precomputed profile of one beam, radians; shared by the single-point and the grid evaluation. */
export type Profile = {
  peaked: boolean;
  outer: number;
  core: number;
  cosOuter: number;
  cosCore: number;
  /** Peaked: P(β) = exp(−ln2·(β/half)^k); the ratio form stays finite when k is huge (tiny softness). */
  half: number;
  k: number;
};

export function makeProfile(ang: BeamAngles, shape: ProfileShape): Profile {
  const peaked = shape === "peaked";
  const k = peaked && ang.outer > ang.half ? LOG_TEN_OVER_HALF / Math.log(ang.outer / ang.half) : Infinity;
  return {
    peaked,
    outer: ang.outer,
    core: ang.core,
    half: ang.half,
    k,
    cosOuter: Math.cos(ang.outer),
    // A peaked beam with no softness is a plain hard-edged disc: the core spans the whole cone.
    // cosCore: at or inside this the intensity is full, so callers can skip acos and the curve.
    cosCore: peaked ? (k === Infinity ? Math.cos(ang.outer) : 1) : ang.core > 0 ? Math.cos(ang.core) : 1,
  };
}

/** Relative intensity (0..1) at angle beta (radians) off the axis. */
export function profileAt(p: Profile, beta: number): number {
  if (beta > p.outer) return 0;
  if (p.peaked) return p.k === Infinity ? 1 : Math.exp(-Math.LN2 * (beta / p.half) ** p.k);
  if (beta <= p.core) return 1;
  return 0.5 * (1 + Math.cos((Math.PI * (beta - p.core)) / (p.outer - p.core)));
}

/**
 * Relative intensity at betaDeg off the axis for a beam of this cone, softness and family.
 * Flat (profile spots, followspots): 1 in the core, the design's cosine fade to 0 at the cone's edge.
 * Peaked (fresnels, washes, PARs, LED washes, cyc floods): exp(−ln2·(β/βb)^k), 1 on the axis, exactly ½ at
 * the 50 % half-angle βb = (θ−s)/2 and exactly 1/10 at the field half-angle θ/2, then 0 beyond (spill under
 * a tenth of the peak is not modelled, so the drawn pool, the grid culling and the light agree).
 */
export function relativeIntensity(
  betaDeg: number,
  coneDeg: number,
  softnessDeg: number,
  family: Family = "profile",
): number {
  const prof = makeProfile(beamAngles(coneDeg, softnessDeg), profileShapeOf(family));
  return profileAt(prof, Math.abs(betaDeg) * DEG);
}

/**
 * Where the flat profile's cosine fade reaches 10 %, as a share of the soft band from the core's edge:
 * ½(1 + cos πx) = 0.1 gives x = acos(−0.8)/π = 0.7952. So the model's 10 % full angle is θ − 2(1 − x)·s
 * = θ − 0.4097·s, and its 50 % full angle θ − s (x = ½).
 */
export const FLAT_TENTH_ACROSS_BAND = Math.acos(-0.8) / Math.PI;
/** (F − B)/s for the flat profile: 1 − 2(1 − x) = 0.5903 (the design's "0.59"). */
const FLAT_FIELD_MINUS_BEAM_PER_SOFTNESS = 1 - 2 * (1 - FLAT_TENTH_ACROSS_BAND);

/**
 * A datasheet's beam (50 %) and field (10 %) angles as the model's cone and softness, so that the model's
 * own 50 % and 10 % points land on them (IES definitions of beam and field angle).
 * - Flat families (profile spots, followspots): the cosine fade reaches 10 % 0.4097·s inside the cone, so
 *   s = (F − B)/0.5903 and θ = B + s (taking θ = F would put the 10 % point about 0.4·s inside the field).
 * - Peaked families: the curve is ½ at (θ − s)/2 and 1/10 at θ/2 by construction, so θ = F and s = F − B.
 * A softness above half the cone leaves no core and is clamped by the beam model: a warning says so, and then
 * the 50 % point no longer lands exactly.
 */
export function fromDatasheet(d: { beamDeg: number; fieldDeg: number; family?: Family }): {
  coneDeg: number;
  softnessDeg: number;
  warning?: string;
} {
  const { beamDeg, fieldDeg } = d;
  const family = d.family ?? "profile";
  if (!Number.isFinite(beamDeg) || !Number.isFinite(fieldDeg) || beamDeg <= 0 || fieldDeg >= 180) {
    throw new RangeError(`Datasheet angles must be above 0° and under 180° (beam ${beamDeg}°, field ${fieldDeg}°).`);
  }
  if (beamDeg > fieldDeg) {
    throw new RangeError(`The beam angle (${beamDeg}°) cannot be wider than the field angle (${fieldDeg}°).`);
  }
  const flat = profileShapeOf(family) === "flat";
  const softnessDeg = flat ? (fieldDeg - beamDeg) / FLAT_FIELD_MINUS_BEAM_PER_SOFTNESS : fieldDeg - beamDeg;
  const out = { coneDeg: flat ? beamDeg + softnessDeg : fieldDeg, softnessDeg };
  if (out.coneDeg >= 180) {
    throw new RangeError(
      `A ${beamDeg}° beam with a ${fieldDeg}° field needs a cone of ${out.coneDeg.toFixed(1)}°, past the model's 180°.`,
    );
  }
  if (out.softnessDeg > out.coneDeg / 2) {
    return {
      ...out,
      warning: `A beam angle this far under the field angle leaves no even core; modelled with a ${+(out.coneDeg / 2).toFixed(2)}° softness, so the 50 % point falls wider than the datasheet's beam.`,
    };
  }
  return out;
}
