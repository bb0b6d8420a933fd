import { describe, expect, it } from "vitest";
import { buildFocusChart, type FocusChart } from "@/lib/focus/chart-model";
import { mergeLandmarks, outlineLandmarks } from "@/lib/focus/landmarks";
import { neighboursOf } from "@/lib/focus/shared-mark";
import { demoFixtures, demoProduction, loadDemoTables } from "./demo-production";
import { planMarkup } from "./render-markup";

/** Every sentence a chart shows, as a reader meets it: a row's label followed by its value, each cut's words. */
function sentences(chart: FocusChart): string[] {
  return [
    ...[...chart.identity, ...chart.focus, ...chart.beam].map((r) => `${r.label} ${r.value}`),
    ...chart.cuts.map((c) => `${c.words} — ${c.cutterWords}`),
    chart.focusedLine,
    ...chart.warnings,
  ];
}

const textOf = (svg: string) => [...svg.matchAll(/<text[^>]*>([^<]*)<\/text>/g)].map((m) => m[1]);

/**
 * Joins that read wrong in English (house style, no source): a word twice in a row ("from from"), a preposition
 * straight after another ("at on", "of of", "to to"), or a count left without its noun ("and 21 on").
 */
function badJoins(s: string): string[] {
  const found: string[] = [];
  const doubled = /\b([A-Za-z]+)\s+\1\b/gi;
  for (const m of s.matchAll(doubled)) found.push(`doubled "${m[0]}"`);
  const prepositions = /\b(at|on|of|to|off|from|in|by)\s+(at|on|of|to|off|from|in|by)\b/gi;
  for (const m of s.matchAll(prepositions)) found.push(`joined "${m[0]}"`);
  if (/\band \d+ on\b/.test(s)) found.push("a count with no noun");
  if (/\bthe the\b|\s{2,}|\s[,.;]/.test(s)) found.push("spacing or article");
  return found;
}

describe("wording of the demo production's focus charts", () => {
  it("no sentence on any chart or focus-call plan has a doubled word or a broken join", async () => {
    const tables = await loadDemoTables();
    const production = demoProduction(tables);
    const fixtures = demoFixtures(tables);
    const landmarks = mergeLandmarks([], outlineLandmarks(production));
    expect(fixtures.length).toBeGreaterThan(100);
    const problems: string[] = [];
    let cutCount = 0;
    for (const f of fixtures) {
      const chart = buildFocusChart(f, production);
      cutCount += chart.cuts.length;
      const svg = planMarkup({ current: f, neighbours: neighboursOf(f, fixtures), landmarks, stage: production });
      for (const s of [...sentences(chart), ...textOf(svg)]) {
        for (const p of badJoins(s)) problems.push(`${f.positionName} ${f.unitNumber}: ${p} in "${s}"`);
      }
    }
    // The demo carries shutter cuts, so their sentences are swept too.
    expect(cutCount).toBeGreaterThan(0);
    expect(problems).toEqual([]);
  });

  it("the sweep itself catches the joins it is meant to catch", () => {
    // house style, no source: each of these was once printed on a chart
    expect(badJoins("Light from from DS, 0° off the centre line").length).toBeGreaterThan(0);
    expect(badJoins("downstage edge cut at on the setting line").length).toBeGreaterThan(0);
    expect(badJoins("unit 14 and 21 on the same mark").length).toBeGreaterThan(0);
    expect(badJoins("unit 14 and 21 others on this mark")).toEqual([]);
  });

  it("the focus-call plan counts the other units on the mark in words", async () => {
    const tables = await loadDemoTables();
    const production = demoProduction(tables);
    const fixtures = demoFixtures(tables);
    const landmarks = outlineLandmarks(production);
    const f = fixtures.find((x) => x.focusPointId != null)!;
    const others = neighboursOf(f, fixtures);
    expect(others.length).toBeGreaterThan(1);
    const svg = planMarkup({ current: f, neighbours: others, landmarks, stage: production });
    expect(textOf(svg)).toContain(`unit ${f.unitNumber} and ${others.length} others on this mark`);
    const one = planMarkup({ current: f, neighbours: others.slice(0, 1), landmarks, stage: production });
    expect(textOf(one)).toContain(`unit ${f.unitNumber} and 1 other on this mark`);
    const alone = planMarkup({ current: f, neighbours: [], landmarks, stage: production });
    expect(textOf(alone)).toContain(`unit ${f.unitNumber}, alone on this mark`);
  });
});
