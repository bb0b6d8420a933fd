import { describe, expect, it } from "vitest";
import { fromDatasheet, irisedConeDeg, peakCandelaAt, relativeIntensity, zoomedBeam } from "@/lib/optics";

/**
 * Independent reference for the flat (profile) model, written out from DESIGN.md's beam model rather than
 * taken from the code: 1 inside βc = (θ − 2s)/2, ½·(1 + cos(π·(β − βc)/(βo − βc))) across the band, 0 beyond
 * βo = θ/2. The full angle where it falls to a given fraction is found by bisection.
 */
function designCurve(betaDeg: number, coneDeg: number, softDeg: number): number {
  const bc = (coneDeg - 2 * softDeg) / 2;
  const bo = coneDeg / 2;
  if (betaDeg <= bc) return 1;
  if (betaDeg >= bo) return 0;
  return 0.5 * (1 + Math.cos((Math.PI * (betaDeg - bc)) / (bo - bc)));
}

function fullAngleAt(fraction: number, coneDeg: number, softDeg: number): number {
  let lo = 0;
  let hi = coneDeg / 2;
  for (let k = 0; k < 200; k++) {
    const mid = (lo + hi) / 2;
    if (designCurve(mid, coneDeg, softDeg) > fraction) lo = mid;
    else hi = mid;
  }
  return lo + hi; // twice the half-angle
}

describe("a datasheet's beam and field angles mapped onto the model", () => {
  it("a profile's 50 % point lands on the beam angle and its 10 % point on the field angle", () => {
    // REFERENCE.md: beam angle = 50 % of the peak, field angle = 10 % (IES definitions);
    // DESIGN.md beam model: s = (F − B)/0.59, θ = B + s
    for (const [beam, field] of [
      [19, 26],
      [22, 30],
      [30, 36],
      [25, 33],
    ] as const) {
      const d = fromDatasheet({ beamDeg: beam, fieldDeg: field, family: "profile" });
      expect(d.warning).toBeUndefined();
      expect(fullAngleAt(0.5, d.coneDeg, d.softnessDeg)).toBeCloseTo(beam, 9);
      expect(fullAngleAt(0.1, d.coneDeg, d.softnessDeg)).toBeCloseTo(field, 9);
      // The code's own curve agrees with the written-out one at both published points.
      expect(relativeIntensity(beam / 2, d.coneDeg, d.softnessDeg, "profile")).toBeCloseTo(0.5, 9);
      expect(relativeIntensity(field / 2, d.coneDeg, d.softnessDeg, "profile")).toBeCloseTo(0.1, 9);
    }
  });

  it("hand-worked: beam 22°, field 30° gives softness 13.55° and cone 35.55°", () => {
    // ½(1 + cos πx) = 0.1 → x = acos(−0.8)/π = 0.795167; 10 % full angle θ − 2(1 − x)s = θ − 0.409666·s;
    // F − B = (1 − 0.409666)·s = 0.590334·s → s = 8/0.590334 = 13.5516°, θ = 22 + 13.5516 = 35.5516°
    const d = fromDatasheet({ beamDeg: 22, fieldDeg: 30 });
    expect(d.softnessDeg).toBeCloseTo(13.5516, 3);
    expect(d.coneDeg).toBeCloseTo(35.5516, 3);
    // The old mapping (cone = field) would put the 10 % point 0.41·s inside the field angle:
    expect(fullAngleAt(0.1, 30, 8)).toBeCloseTo(30 - 0.409666 * 8, 5);
  });

  it("peaked families keep cone = field, softness = field − beam (their curve passes through both points)", () => {
    // DESIGN.md: peaked profile, ½ at (θ − s)/2 and 1/10 at θ/2 by construction
    const d = fromDatasheet({ beamDeg: 30, fieldDeg: 50, family: "fresnel" });
    expect(d).toEqual({ coneDeg: 50, softnessDeg: 20 });
    expect(relativeIntensity(15, 50, 20, "fresnel")).toBeCloseTo(0.5, 12);
    expect(relativeIntensity(25, 50, 20, "fresnel")).toBeCloseTo(0.1, 12);
  });

  it("warns when the beam is so far under the field that no even core is left", () => {
    // DESIGN.md: the core is empty when θ ≤ 2s; B 10, F 40: s = 50.8°, θ = 60.8° → s > θ/2
    expect(fromDatasheet({ beamDeg: 10, fieldDeg: 40 }).warning).toMatch(/no even core/);
    expect(() => fromDatasheet({ beamDeg: 50, fieldDeg: 40 })).toThrow(RangeError);
  });
});

describe("peak intensity along a zoom's range", () => {
  const zoom = { coneMinDeg: 15, coneMaxDeg: 40, peakCandela: 20_000, peakCandelaNarrow: 90_000 };

  it("gives the stored figures at both ends and interpolates in 1/tan²(θ/2) between them", () => {
    // from memory: the same flux in a narrower cone gives a peak in proportion to 1/tan²(θ/2).
    expect(peakCandelaAt(zoom, 40)).toBe(20_000);
    expect(peakCandelaAt(zoom, 15)).toBeCloseTo(90_000, 9);
    // Hand-worked at 25°: 1/tan²(7.5°) = 57.6955, 1/tan²(12.5°) = 20.3465, 1/tan²(20°) = 7.5486;
    // u = (20.3465 − 7.5486)/(57.6955 − 7.5486) = 0.255208; 20,000 + 0.255208·70,000 = 37,864.5 cd
    const t = (deg: number) => 1 / Math.tan((deg / 2) * (Math.PI / 180)) ** 2;
    const u = (t(25) - t(40)) / (t(15) - t(40));
    expect(u).toBeCloseTo(0.255208, 5);
    expect(peakCandelaAt(zoom, 25)).toBeCloseTo(20_000 + u * 70_000, 6);
    expect(peakCandelaAt(zoom, 25)).toBeCloseTo(37_864.5, 0);
  });

  it("gets brighter as it narrows, and holds at the ends outside the range", () => {
    let last = 0;
    for (let c = 40; c >= 15; c -= 0.5) {
      const p = peakCandelaAt(zoom, c);
      expect(p).toBeGreaterThan(last);
      last = p;
    }
    expect(peakCandelaAt(zoom, 10)).toBeCloseTo(90_000, 9);
    expect(peakCandelaAt(zoom, 60)).toBe(20_000);
  });

  it("a fixed type, or a zoom with one figure, keeps its peak", () => {
    expect(peakCandelaAt({ coneMinDeg: 26, coneMaxDeg: 26, peakCandela: 46_000 }, 26)).toBe(46_000);
    expect(peakCandelaAt({ ...zoom, peakCandelaNarrow: null }, 15)).toBe(20_000);
  });

  it("an iris narrows the beam without brightening it", () => {
    // similar triangles: an iris open to 50 % of its diameter halves the image, tan(θ'/2) = 0.5·tan(θ/2);
    // hand-worked for a 30° zoom: 2·atan(0.5·tan 15°) = 2·atan(0.133975) = 2·7.6307° = 15.2615°
    expect(irisedConeDeg(30, 50)).toBeCloseTo(15.2615, 3);
    expect(irisedConeDeg(30, null)).toBe(30);
    // The iris narrows the cone but the peak stays that of the 30° zoom setting ...
    const open = zoomedBeam(zoom, 30, null);
    const irised = zoomedBeam(zoom, 30, 50);
    expect(irised.coneDeg).toBeCloseTo(15.2615, 3);
    expect(irised.peakCandela).toBe(open.peakCandela);
    expect(open.peakCandela).toBe(peakCandelaAt(zoom, 30));
    // ... whereas zooming down to the same cone does brighten it.
    expect(zoomedBeam(zoom, irised.coneDeg).peakCandela).toBeGreaterThan(irised.peakCandela);
    expect(() => irisedConeDeg(30, 0)).toThrow(RangeError);
  });
});
