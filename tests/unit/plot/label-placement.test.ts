// The printed plot's label pass: no two labels overlap, and none covers a unit's symbol where a free
// spot exists. Every check is a brute-force pairwise test written here (common practice, no source).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  type Box,
  type LabelRequest,
  candidateSpots,
  leaderEnd,
  placeLabels,
  textBox,
} from "@/lib/plot/label-placement";

// Independent of the module: interiors overlap when both spans overlap by more than a hair.
const overlaps = (a: Box, b: Box) =>
  Math.min(a.x + a.w, b.x + b.w) - Math.max(a.x, b.x) > 1e-6 &&
  Math.min(a.y + a.h, b.y + b.h) - Math.max(a.y, b.y) > 1e-6;
const within = (b: Box, o: Box) =>
  b.x >= o.x - 1e-6 && b.y >= o.y - 1e-6 && b.x + b.w <= o.x + o.w + 1e-6 && b.y + b.h <= o.y + o.h + 1e-6;
const symbolAt = (x: number, y: number, size = 4): Box => ({ x: x - size / 2, y: y - size / 2, w: size, h: size });

const bounds: Box = { x: 0, y: 0, w: 200, h: 120 };

describe("placeLabels", () => {
  it("puts a label beside its anchor when the spot is free", () => {
    const { placed } = placeLabels([{ id: "LX1", w: 10, h: 3, anchors: [{ x: 50, y: 50 }] }], [], { bounds, gap: 1 });
    expect(placed[0].box).toEqual({ x: 51, y: 48.5, w: 10, h: 3 });
    expect(placed[0].leader).toBe(false);
  });

  it("moves off a unit's symbol to a free side", () => {
    // a unit sits just right of the boom's foot; the label goes to its left instead
    const { placed } = placeLabels([{ id: "SR boom", w: 12, h: 3, anchors: [{ x: 50, y: 50 }] }], [symbolAt(55, 50)], {
      bounds,
      gap: 1,
    });
    expect(placed[0].coversSymbol).toBe(false);
    expect(overlaps(placed[0].box, symbolAt(55, 50))).toBe(false);
    expect(placed[0].box.x + placed[0].box.w).toBeLessThanOrEqual(50);
  });

  it("stacks labels of units hung side by side rather than overlapping them", () => {
    const labels: LabelRequest[] = [0, 1, 2, 3].map((i) => ({
      id: `boom ${i}`,
      w: 14,
      h: 3,
      anchors: [{ x: 100, y: 60 + i }],
    }));
    const { placed, unplaced } = placeLabels(labels, [], { bounds, gap: 1 });
    expect(unplaced).toEqual([]);
    for (let i = 0; i < placed.length; i++)
      for (let j = i + 1; j < placed.length; j++) expect(overlaps(placed[i].box, placed[j].box)).toBe(false);
  });

  it("covers the least symbol area when no free spot is left, and leaves out a label with no room at all", () => {
    // a sheet so small that every spot meets the symbol: the label still goes down, on the least-covered spot
    const tiny: Box = { x: 0, y: 0, w: 20, h: 8 };
    const sym = symbolAt(10, 4, 10);
    const r = placeLabels([{ id: "A", w: 6, h: 3, anchors: [{ x: 10, y: 4 }] }], [sym], {
      bounds: tiny,
      gap: 1,
      rings: 2,
    });
    expect(r.placed[0].coversSymbol).toBe(true);
    const covered = (b: Box) =>
      Math.max(0, Math.min(b.x + b.w, sym.x + sym.w) - Math.max(b.x, sym.x)) *
      Math.max(0, Math.min(b.y + b.h, sym.y + sym.h) - Math.max(b.y, sym.y));
    const best = Math.min(
      ...candidateSpots({ id: "A", w: 6, h: 3, anchors: [{ x: 10, y: 4 }] }, { bounds: tiny, gap: 1, rings: 2 })
        .filter((c) => within(c.box, tiny))
        .map((c) => covered(c.box)),
    );
    expect(covered(r.placed[0].box)).toBeCloseTo(best, 9);
    // a label wider than the sheet cannot go anywhere
    const none = placeLabels([{ id: "too wide", w: 30, h: 3, anchors: [{ x: 10, y: 4 }] }], [], { bounds: tiny });
    expect(none).toEqual({ placed: [], unplaced: ["too wide"] });
  });

  it("on random sheets: labels never overlap, stay inside, and cover a symbol only when every spot tried was taken", () => {
    const point = fc.record({
      x: fc.double({ min: 5, max: 195, noNaN: true }),
      y: fc.double({ min: 5, max: 115, noNaN: true }),
    });
    fc.assert(
      fc.property(
        fc.array(fc.record({ anchor: point, chars: fc.integer({ min: 2, max: 14 }) }), { minLength: 1, maxLength: 25 }),
        fc.array(point, { maxLength: 60 }),
        (labelSpecs, symbolPoints) => {
          const labels = labelSpecs.map((l, i) => ({
            id: String(i),
            ...textBox("x".repeat(l.chars), 2.6),
            anchors: [l.anchor],
          }));
          const symbols = symbolPoints.map((p) => symbolAt(p.x, p.y));
          const opts = { bounds, gap: 1.2, rings: 4 };
          const { placed, unplaced } = placeLabels(labels, symbols, opts);
          expect(placed.length + unplaced.length).toBe(labels.length);
          for (let i = 0; i < placed.length; i++) {
            expect(within(placed[i].box, bounds)).toBe(true);
            for (let j = i + 1; j < placed.length; j++) expect(overlaps(placed[i].box, placed[j].box)).toBe(false);
            const hitsSymbol = symbols.some((s) => overlaps(s, placed[i].box));
            expect(hitsSymbol).toBe(placed[i].coversSymbol);
            if (!hitsSymbol) continue;
            // brute force: every spot this label could have had was off the sheet, on an earlier label or on a symbol
            const earlier = placed.slice(0, i).map((p) => p.box);
            const label = labels[Number(placed[i].id)];
            for (const c of candidateSpots(label, opts))
              expect(
                !within(c.box, bounds) ||
                  earlier.some((e) => overlaps(e, c.box)) ||
                  symbols.some((s) => overlaps(s, c.box)),
              ).toBe(true);
          }
        },
      ),
      { numRuns: 300, seed: 1305 },
    );
  });

  it("ends a leader line on the box edge nearest the anchor", () => {
    expect(leaderEnd({ x: 10, y: 10, w: 8, h: 3 }, { x: 5, y: 11 })).toEqual({ x: 10, y: 11 });
    expect(leaderEnd({ x: 10, y: 10, w: 8, h: 3 }, { x: 25, y: 30 })).toEqual({ x: 18, y: 13 });
  });
});
