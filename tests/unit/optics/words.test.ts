import { describe, expect, it } from "vitest";
import { describeBeam, describePoint, edgeWord } from "@/lib/optics";
import { D2R } from "./helpers";

describe("describePoint", () => {
  it("words the datum one way, with its article, as DESIGN.md's example does", () => {
    // DESIGN.md, coordinates: "3.20 m SL of CL, 1.50 m US of the setting line"
    expect(describePoint({ x: 3.2, y: 1.5 }, { units: "metric", datumName: "setting line" })).toBe(
      "3.20 m SL of CL, 1.50 m US of the setting line",
    );
    // A name that already has its article, or begins with a number, is left alone (English usage).
    expect(describePoint({ x: 0, y: 1.5 }, { units: "metric", datumName: "The stage edge" })).toBe(
      "on CL, 1.50 m US of The stage edge",
    );
    expect(describePoint({ x: 0, y: -1 }, { units: "metric", datumName: "2nd line" })).toBe(
      "on CL, 1.00 m DS of 2nd line",
    );
  });

  it("names side and depth in deck words", () => {
    // DESIGN.md: coordinates (x > 0 stage left, y > 0 upstage) and deck words
    expect(describePoint({ x: 1.2, y: 2.5 }, { units: "metric", datumName: "setting line" })).toBe(
      "1.20 m SL of CL, 2.50 m US of the setting line",
    );
    expect(describePoint({ x: -3.2, y: -1.5 }, { units: "metric", datumName: "the plaster line" })).toBe(
      "3.20 m SR of CL, 1.50 m DS of the plaster line",
    );
  });

  it("says 'on' when the value shows as zero", () => {
    // house rule: on the line say "on CL"; the datum always with its article (DESIGN.md's example)
    expect(describePoint({ x: 0.004, y: 0 }, { units: "metric", datumName: "setting line" })).toBe(
      "on CL, on the setting line",
    );
    expect(describePoint({ x: 0.006, y: 0 }, { units: "metric" })).toBe("0.01 m SL of CL, on the setting line");
  });

  it("uses feet and inches for imperial productions", () => {
    // NIST SP 811: 3.2131 m = 10 ft 6.5 in
    expect(describePoint({ x: -3.2131, y: 0.3048 }, { units: "imperial", datumName: "proscenium line" })).toBe(
      `10' 6 1/2" SR of CL, 1' 0" US of the proscenium line`,
    );
  });
});

describe("describeBeam", () => {
  /** Lens placed offDeg off the centre line and elevDeg up, on the given side of a mark at the origin. */
  function lens(offDeg: number, elevDeg: number, sx: number, sy: number, dist = 10) {
    return {
      x: sx * dist * Math.sin(offDeg * D2R),
      y: sy * dist * Math.cos(offDeg * D2R),
      z: dist * Math.tan(elevDeg * D2R),
    };
  }
  const mark = { x: 0, y: 0, z: 0 };

  it("says where the light comes from, its angle off the centre line and its angle down", () => {
    // DESIGN.md: a beam "from DSR, 25° off the centre line, 40° down"
    expect(describeBeam(lens(25, 40, -1, -1), mark)).toBe("from DSR, 25° off the centre line, 40° down");
    expect(describeBeam(lens(45, 45, 1, -1), mark)).toBe("from DSL, 45° off the centre line, 45° down");
    expect(describeBeam(lens(30, 60, 1, 1), mark)).toBe("from USL, 30° off the centre line, 60° down");
  });

  it("uses front, back and side words near the axes (house convention, 15° and 75°)", () => {
    // common practice, no source: straight front, back and side light
    expect(describeBeam(lens(5, 30, -1, -1), mark)).toBe("from DS, 5° off the centre line, 30° down");
    expect(describeBeam(lens(0, 50, 1, 1), mark)).toBe("from US, 0° off the centre line, 50° down");
    expect(describeBeam(lens(88, 20, -1, 1), mark)).toBe("from SR, 88° off the centre line, 20° down");
    // 14.6° prints as 15°, so it reads as a diagonal, in step with the number shown.
    expect(describeBeam(lens(14.6, 30, -1, -1), mark)).toBe("from DSR, 15° off the centre line, 30° down");
    expect(describeBeam(lens(75.4, 30, 1, 1), mark)).toBe("from USL, 75° off the centre line, 30° down");
  });

  it("handles a lens straight overhead and one below the mark", () => {
    // trigonometry: elevation 90° overhead; a footlight aims up
    expect(describeBeam({ x: 1, y: 2, z: 8 }, { x: 1, y: 2, z: 0 })).toBe("from directly above, 90° down");
    expect(describeBeam({ x: 0, y: -2, z: 0 }, { x: 0, y: 0, z: 1.7 })).toBe("from DS, 0° off the centre line, 40° up");
  });
});

describe("edgeWord", () => {
  it("grades softness against the cone (house convention: 10 % and 30 %)", () => {
    // common practice, no source
    expect(edgeWord(36, 0)).toBe("sharp");
    expect(edgeWord(36, 3.5)).toBe("sharp");
    expect(edgeWord(36, 4)).toBe("soft");
    expect(edgeWord(36, 12)).toBe("very soft");
    expect(edgeWord(36, 40)).toBe("very soft");
    expect(() => edgeWord(0, 1)).toThrow(RangeError);
  });
});
