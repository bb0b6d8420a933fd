// What the server computes for every fixture it returns: where the lens is, where it aims,
// and its pools at the deck and at head height. The API is the authority for these numbers.
import { beamAim, poolAtPlane, type PlanePool, type Vec3 } from "@/lib/optics";
import type { FixtureMounting } from "@/models/fixture-mountings";

/** A fixture's own stored aim: where it hangs, where it points, how big and soft its beam is (null = the default). */
export type FixtureAim = {
  x: number;
  y: number;
  lensHeight: number | null;
  focusX: number | null;
  focusY: number | null;
  aim: "deck" | "head";
  coneDeg: number | null;
  softnessDeg: number | null;
};

export type GeometryInput = FixtureAim & {
  focusPoint: { x: number; y: number } | null;
  position: { trimHeight: number };
  type: { coneMinDeg: number; coneMaxDeg: number; defaultSoftnessDeg: number } & MountedType;
};

/** What a type says about where its lens sits; a type stored before mountings existed is under-hung. */
export type MountedType = { lensDropM: number; mounting?: FixtureMounting; lensRiseM?: number };

export type FixtureGeometry = {
  lensHeight: number;
  lensHeightIsDefault: boolean;
  coneDeg: number;
  /** True where the unit has no cone of its own and takes its type's widest. */
  coneIsDefault: boolean;
  softnessDeg: number;
  softnessIsDefault: boolean;
  /** The type's cone range; equal ends mean a fixed-angle lens (no zoom, no spot/flood travel). */
  coneRange: { min: number; max: number };
  source: Vec3;
  focus: Vec3 | null;
  throw: number | null;
  tiltDeg: number | null;
  panDeg: number | null;
  deck: PlanePool | null;
  head: PlanePool | null;
};

/**
 * The lens height a unit takes from its position's trim when it has none of its own (booms and ladders
 * set their own). The trim is the height of the pipe, rail or truss chord the unit is clamped to (for a
 * floor position, of the deck or platform it stands on):
 * - under-hung: hanging below the pipe, the lens sits the type's lens drop under the trim;
 * - over-hung: standing on a rail or truss top, its lens rise above the trim;
 * - side-arm: clamped beside the pipe on an arm, the lens is level with the pipe (common practice, no source);
 * - floor: standing on its base or stand, its lens rise above the surface at the trim.
 * The one home of this rule: the API, the plot's previews and the studies all ask here.
 */
export function defaultLensHeight(trimHeight: number, type: MountedType): number {
  switch (type.mounting ?? "under-hung") {
    case "over-hung":
    case "floor":
      return Math.max(0, trimHeight + (type.lensRiseM ?? 0));
    case "side-arm":
      return Math.max(0, trimHeight);
    default:
      return Math.max(0, trimHeight - type.lensDropM);
  }
}

export function computeFixtureGeometry(f: GeometryInput, headHeight: number): FixtureGeometry {
  const lensHeight = f.lensHeight ?? defaultLensHeight(f.position.trimHeight, f.type);
  const coneDeg = f.coneDeg ?? f.type.coneMaxDeg;
  const softnessDeg = f.softnessDeg ?? f.type.defaultSoftnessDeg;
  const source: Vec3 = { x: f.x, y: f.y, z: lensHeight };
  const mark = f.focusPoint ?? (f.focusX != null && f.focusY != null ? { x: f.focusX, y: f.focusY } : null);
  const base = {
    lensHeight,
    lensHeightIsDefault: f.lensHeight == null,
    coneDeg,
    coneIsDefault: f.coneDeg == null,
    softnessDeg,
    softnessIsDefault: f.softnessDeg == null,
    coneRange: { min: f.type.coneMinDeg, max: f.type.coneMaxDeg },
    source,
  };
  if (!mark) return { ...base, focus: null, throw: null, tiltDeg: null, panDeg: null, deck: null, head: null };

  const focus: Vec3 = { x: mark.x, y: mark.y, z: f.aim === "head" ? headHeight : 0 };
  const aim = beamAim({ source, focus });
  const pool = (planeZ: number) => poolAtPlane({ source, focus, coneDeg, softnessDeg, planeZ });
  return {
    ...base,
    focus,
    throw: aim.throw,
    tiltDeg: aim.tiltDeg,
    panDeg: aim.panDeg,
    deck: pool(0),
    head: pool(headHeight),
  };
}
