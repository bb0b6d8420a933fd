// The chart's wording of a gobo's rotation and of barn doors as focused, from the fixture's own
// fields, and the focus photo's place on the chart.
import { describe, expect, it } from "vitest";
import { buildFocusChart } from "@/lib/focus/chart-model";
import { focusRow } from "@/lib/focus/excel";
import { barnDoorWords, goboRotationWords } from "@/lib/focus/words";
import { outlineLandmarks } from "@/lib/focus/landmarks";
import { makeFixture, PRODUCTION } from "./fixture-builder";
import { chartMarkup } from "./render-markup";

const value = (rows: Array<{ key: string; value: string }>, key: string) => rows.find((r) => r.key === key)?.value;

describe("gobo rotation in words", () => {
  // common practice, no source: a turn is named the short way round; degrees clockwise looking along the beam.
  it("names 0°, 180° and the shorter way round", () => {
    expect(goboRotationWords(0)).toBe("upright, as drawn (0°)");
    expect(goboRotationWords(45)).toBe("45° clockwise, looking along the beam");
    expect(goboRotationWords(180)).toBe("upside down (180°)");
    expect(goboRotationWords(270)).toBe("90° anticlockwise (270°), looking along the beam");
    expect(goboRotationWords(292.5)).toBe("67.5° anticlockwise (292.5°), looking along the beam");
  });
  it("rounds to a tenth of a degree and wraps a full turn to upright", () => {
    expect(goboRotationWords(359.96)).toBe("upright, as drawn (0°)");
    expect(goboRotationWords(12.34)).toBe("12.3° clockwise, looking along the beam");
  });
  it("a lens's inversion (a 180° turn in the plane) does not change the sense of a rotation", () => {
    // Plane geometry: rotations about one point commute, so R(180°)·R(θ) = R(θ)·R(180°) — the image of a gobo
    // turned θ clockwise is the inverted image turned θ clockwise. Checked on a point, not taken from the code.
    const rot = (p: [number, number], deg: number): [number, number] => {
      const r = (-deg * Math.PI) / 180; // clockwise
      return [p[0] * Math.cos(r) - p[1] * Math.sin(r), p[0] * Math.sin(r) + p[1] * Math.cos(r)];
    };
    const p: [number, number] = [0.3, 0.8];
    const a = rot(rot(p, 40), 180);
    const b = rot(rot(p, 180), 40);
    expect(a[0]).toBeCloseTo(b[0], 12);
    expect(a[1]).toBeCloseTo(b[1], 12);
  });
});

describe("barn doors in words", () => {
  it("lists the leaves with a note, in top, bottom, left, right order", () => {
    expect(barnDoorWords({ left: "to the leg", top: " in halfway " })).toBe("top in halfway · left to the leg");
    expect(barnDoorWords({ top: "", bottom: null })).toBeNull();
  });
});

describe("the chart's rows", () => {
  it("uses the fixture's own gobo rotation and barn doors before an accessory's note", () => {
    const f = makeFixture({
      gobo: "leaf breakup",
      goboRotationDeg: 90,
      barnDoorBottom: "off the lip",
      family: "profile",
    }); // a fresnel takes no gobo, so its chart has no gobo row
    const chart = buildFocusChart(f, PRODUCTION, {
      extras: { accessories: ["barn doors"], barnDoors: "fitted", goboOrientation: "slot A" },
    });
    expect(value(chart.beam, "goboOrientation")).toBe("90° clockwise, looking along the beam");
    expect(value(chart.beam, "barnDoors")).toBe("bottom off the lip");
  });
  it("falls back to the accessory's note, and says so when nothing is recorded", () => {
    const withAccessory = buildFocusChart(makeFixture({ gobo: "breakup" }), PRODUCTION, {
      extras: { barnDoors: "fitted", goboOrientation: "slot A" },
    });
    expect(value(withAccessory.beam, "goboOrientation")).toBe("slot A");
    expect(value(withAccessory.beam, "barnDoors")).toBe("fitted");
    const bare = buildFocusChart(makeFixture(), PRODUCTION);
    expect(value(bare.beam, "goboOrientation")).toBe("no gobo");
    expect(value(bare.beam, "barnDoors")).toBe("none recorded");
    const rotationOnly = buildFocusChart(makeFixture({ goboRotationDeg: 180 }), PRODUCTION);
    expect(value(rotationOnly.beam, "goboOrientation")).toBe("upside down (180°) (no gobo named)");
  });
  it("shows the focus photo's small copy beside the notes and notes it in the workbook", () => {
    const f = makeFixture({ id: 31, productionId: 4, focusPhotoUploadId: 9 });
    const chart = buildFocusChart(f, PRODUCTION);
    expect(chart.photo).toEqual({
      uploadId: 9,
      thumbSrc: "/api/productions/4/fixtures/31/photo?u=9&size=thumb",
      href: "/api/productions/4/fixtures/31/photo?u=9",
    });
    const html = chartMarkup(chart, { landmarks: outlineLandmarks(PRODUCTION), units: "metric" });
    expect(html).toContain('class="fc-photo" href="/api/productions/4/fixtures/31/photo?u=9"');
    expect(html).toContain('src="/api/productions/4/fixtures/31/photo?u=9&amp;size=thumb"');
    expect(focusRow(chart).photo).toBe("taken");
    // In the PDF the small copy is inline and there is no link to follow.
    const inline = chartMarkup(
      { ...chart, photo: { ...chart.photo!, thumbSrc: "data:image/jpeg;base64,AAAA", href: "" } },
      { landmarks: [], units: "metric" },
    );
    expect(inline).toContain('<span class="fc-photo"><img src="data:image/jpeg;base64,AAAA"');
    expect(buildFocusChart(makeFixture(), PRODUCTION).photo).toBeNull();
  });
});
