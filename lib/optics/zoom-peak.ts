// How a type's peak intensity follows its zoom. A zoom (or a spot/flood fresnel) puts about the same light
// into a smaller cone as it narrows, so it gets brighter; an iris cuts the beam down in the gate and throws
// the rest away, so it narrows the beam without brightening it. The type stores its peak at both ends of its
// range; between them the peak is interpolated in proportion to 1/tan²(θ/2) — the solid angle a cone of
// full angle θ covers goes roughly as tan²(θ/2), so the same flux over it gives a peak in 1/tan²(θ/2)
// (from memory; real lenses lose some light at the narrow end, which the two stored ends take care of).
import { assertFinite } from "./validate";
import { DEG } from "./vector";

export type ZoomPeakType = {
  coneMinDeg: number;
  coneMaxDeg: number;
  /** Peak candela at the widest cone (the only figure for a fixed-angle type). */
  peakCandela: number;
  /** Peak candela at the narrowest cone; null when the datasheet gives one figure (the peak then stays). */
  peakCandelaNarrow?: number | null;
};

const spread = (coneDeg: number) => 1 / Math.tan((coneDeg / 2) * DEG) ** 2;

/**
 * Peak candela at a zoom setting. `zoomConeDeg` is the cone the zoom (or spot/flood) is set to — never a cone
 * narrowed by the iris, since an iris keeps the peak. Settings outside the type's range are held at its ends.
 */
export function peakCandelaAt(t: ZoomPeakType, zoomConeDeg: number): number {
  assertFinite("Peak intensity", t.peakCandela);
  assertFinite("Cone angle", zoomConeDeg);
  const narrow = t.peakCandelaNarrow;
  if (narrow == null || !(t.coneMaxDeg > t.coneMinDeg)) return t.peakCandela;
  assertFinite("Peak intensity at the narrowest cone", narrow);
  const cone = Math.min(t.coneMaxDeg, Math.max(t.coneMinDeg, zoomConeDeg));
  const u = (spread(cone) - spread(t.coneMaxDeg)) / (spread(t.coneMinDeg) - spread(t.coneMaxDeg));
  return t.peakCandela + u * (narrow - t.peakCandela);
}

/**
 * The cone left by an iris open to `irisPercent` of its diameter: the iris sits in the gate, so the image (and
 * the beam's width at any throw) shrinks in proportion, tan(θ'/2) = p·tan(θ/2) (similar triangles).
 */
export function irisedConeDeg(zoomConeDeg: number, irisPercent: number | null | undefined): number {
  if (irisPercent == null) return zoomConeDeg;
  assertFinite("Iris", irisPercent);
  if (irisPercent <= 0 || irisPercent > 100)
    throw new RangeError(`Iris must be more than 0 % and at most 100 % open (got ${irisPercent}).`);
  return (2 * Math.atan((irisPercent / 100) * Math.tan((zoomConeDeg / 2) * DEG))) / DEG;
}

/** The beam a zoom setting and an iris give: the iris narrows the cone, the zoom alone sets the peak. */
export function zoomedBeam(
  t: ZoomPeakType,
  zoomConeDeg: number,
  irisPercent?: number | null,
): { coneDeg: number; peakCandela: number } {
  return { coneDeg: irisedConeDeg(zoomConeDeg, irisPercent), peakCandela: peakCandelaAt(t, zoomConeDeg) };
}
