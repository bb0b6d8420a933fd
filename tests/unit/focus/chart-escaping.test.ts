// Text typed by people (purposes, notes, names) must reach the chart as text, never as markup: the chart is
// rendered by React on the screen, in the print view and (as static markup) in the server's PDF.
import { describe, expect, it } from "vitest";
import { buildFocusChart } from "@/lib/focus/chart-model";
import { outlineLandmarks } from "@/lib/focus/landmarks";
import { paginate } from "@/lib/focus/pages";
import { focusSheetsMarkup } from "@/lib/pdf/focus-sheets-markup";
import { makeFixture, PRODUCTION } from "./fixture-builder";
import { chartMarkup } from "./render-markup";

const SCRIPT = "<script>alert(1)</script>";
const BREAKOUT = '"><img src=x onerror=alert(1)>';

/** Every real tag in the markup: escaped text holds no raw "<", so it cannot match. */
const tags = (html: string) => html.match(/<[a-zA-Z][^>]*>/g) ?? [];

function hostileChart() {
  const fixture = makeFixture({
    id: 41,
    productionId: 2,
    focusPhotoUploadId: 5,
    purpose: SCRIPT,
    notes: BREAKOUT,
    focusNotes: SCRIPT,
    colour: BREAKOUT,
    gobo: SCRIPT,
    positionName: BREAKOUT,
    unitNumber: SCRIPT,
    focusPointName: BREAKOUT,
    shutterCuts: [{ label: "top", a: { x: -4, y: 1.5 }, b: { x: 4, y: 1.5 } }],
  });
  const landmarks = [{ name: SCRIPT, a: { x: -6, y: 2 }, b: { x: 6, y: 2 } }, ...outlineLandmarks(PRODUCTION)];
  return { chart: buildFocusChart(fixture, PRODUCTION, { landmarks }), landmarks };
}

function expectInert(html: string) {
  const all = tags(html);
  expect(all.some((t) => /^<script/i.test(t))).toBe(false);
  // No tag carries an event handler: attribute values (quoted, their own quotes escaped) are set aside first.
  expect(all.filter((t) => /\son\w+\s*=/i.test(t.replace(/"[^"]*"/g, '""')))).toEqual([]);
  // The only picture is the focus photo the chart itself places.
  expect(all.filter((t) => /^<img/i.test(t))).toHaveLength(1);
  expect(html).toContain("&lt;script&gt;alert(1)&lt;/script&gt;");
  expect(html).toContain("&quot;&gt;&lt;img src=x onerror=alert(1)&gt;");
}

describe("a focus chart shows hostile text as text", () => {
  it("on the screen and in the print view (the chart component)", () => {
    const { chart, landmarks } = hostileChart();
    const html = chartMarkup(chart, { landmarks, units: "metric" });
    expectInert(html);
    // The alt text and the photo link are attributes: quotes inside them stay escaped.
    expect(html).toContain(
      `alt="As focused: &quot;&gt;&lt;img src=x onerror=alert(1)&gt; unit &lt;script&gt;alert(1)&lt;/script&gt;"`,
    );
  });

  it("in the server's PDF sheets (static markup), header included", () => {
    const { chart, landmarks } = hostileChart();
    const sheets = paginate([chart], 4, { newPagePerPosition: true });
    const [html] = focusSheetsMarkup(sheets, {
      productionName: SCRIPT,
      printedAt: BREAKOUT,
      perPage: 4,
      units: "metric",
      landmarks,
    });
    expectInert(html);
    expect(html).toContain("<b>&lt;script&gt;alert(1)&lt;/script&gt;</b>");
  });

  it("the check itself catches markup that is not escaped", () => {
    // The same assertions fail on a chart built by joining strings, as the old renderer would without its escape.
    expect(() => expectInert(`<p>${SCRIPT}</p><img src="a"><p>${BREAKOUT}</p>`)).toThrow();
    expect(() =>
      expectInert(
        `<img alt="${BREAKOUT}"> &lt;script&gt;alert(1)&lt;/script&gt; &quot;&gt;&lt;img src=x onerror=alert(1)&gt;`,
      ),
    ).toThrow();
  });
});
