import { describe, expect, it } from "vitest";
import { checkDmx, fitsUniverse, UNIT_LOADS_PER_SEGMENT } from "@/lib/checks";
import { unit } from "./fixtures";

const run = (fixtures: ReturnType<typeof unit>[], extra: Partial<Parameters<typeof checkDmx>[0]> = {}) =>
  checkDmx({ fixtures, accessories: [], dataLines: [], cueChannels: [], ...extra });

describe("footprints against the universe", () => {
  it("fits only s ≥ 1 and s + N − 1 ≤ 512", () => {
    // ANSI E1.11 (REFERENCE.md): (500, 13) valid, (500, 14) invalid, (512, 1) valid, (512, 2) invalid
    expect(fitsUniverse(500, 13)).toBe(true);
    expect(fitsUniverse(500, 14)).toBe(false);
    expect(fitsUniverse(512, 1)).toBe(true);
    expect(fitsUniverse(512, 2)).toBe(false);
    expect(fitsUniverse(0, 1)).toBe(false); // ANSI E1.11: addresses 1–512
    expect(fitsUniverse(1, 0)).toBe(false);
  });

  it("flags a 16-slot fixture at address 500 as not fitting", () => {
    // ANSI E1.11: 500 + 16 − 1 = 515 > 512
    const r = run([
      unit({ id: 1, universe: 1, address: 500, footprint: 16, loadKind: "switch-mode", dmxMode: "full" }),
    ]);
    const err = r.findings.filter((f) => f.severity === "error");
    expect(err).toHaveLength(1);
    expect(err[0].message).toMatch(/runs to slot 515/);
    expect(err[0].fixtureIds).toEqual([1]);
  });
});

describe("overlaps and deliberate shares", () => {
  it("an overlap of two different units is an error naming both", () => {
    // ANSI E1.11: one slot carries one level; 1–8 and 5–12 share slots 5–8
    const r = run([
      unit({
        id: 1,
        universe: 1,
        address: 1,
        footprint: 8,
        fixtureTypeId: 7,
        dmxMode: "standard",
        loadKind: "switch-mode",
      }),
      unit({
        id: 2,
        universe: 1,
        address: 5,
        footprint: 8,
        fixtureTypeId: 7,
        dmxMode: "standard",
        loadKind: "switch-mode",
      }),
    ]);
    const errors = r.findings.filter((f) => f.severity === "error");
    expect(errors).toHaveLength(2);
    expect(errors.flatMap((e) => e.fixtureIds)).toEqual(expect.arrayContaining([1, 2]));
    expect(r.shared).toEqual([]);
    expect(r.universes[0].segments).toEqual([{ start: 1, end: 12, state: "conflict" }]);
  });

  it("same type in the same mode at the same start is shared, not an error", () => {
    const r = run([
      unit({
        id: 1,
        universe: 2,
        address: 10,
        footprint: 8,
        fixtureTypeId: 7,
        dmxMode: "standard",
        loadKind: "switch-mode",
      }),
      unit({
        id: 2,
        universe: 2,
        address: 10,
        footprint: 8,
        fixtureTypeId: 7,
        dmxMode: "standard",
        loadKind: "switch-mode",
      }),
    ]);
    expect(r.findings.filter((f) => f.severity === "error")).toEqual([]);
    expect(r.shared).toHaveLength(1);
    expect(r.shared[0]).toMatchObject({ universe: 2, address: 10, fixtureIds: [1, 2] });
    expect(r.universes).toEqual([{ universe: 2, slotsUsed: 8, segments: [{ start: 10, end: 17, state: "shared" }] }]);
  });

  it("same start but a different mode is an overlap", () => {
    const r = run([
      unit({
        id: 1,
        universe: 1,
        address: 10,
        footprint: 8,
        fixtureTypeId: 7,
        dmxMode: "standard",
        loadKind: "switch-mode",
      }),
      unit({
        id: 2,
        universe: 1,
        address: 10,
        footprint: 4,
        fixtureTypeId: 7,
        dmxMode: "compact",
        loadKind: "switch-mode",
      }),
    ]);
    expect(r.findings.filter((f) => f.severity === "error")).toHaveLength(2);
    expect(r.shared).toEqual([]);
  });

  it("two conventional units on one dimmer are shared; an LED unit on that slot is not", () => {
    const two = run([
      unit({ id: 1, universe: 1, address: 3, fixtureTypeId: 1 }),
      unit({ id: 2, universe: 1, address: 3, fixtureTypeId: 2 }),
    ]);
    expect(two.findings.filter((f) => f.severity === "error")).toEqual([]);
    expect(two.shared[0].why).toMatch(/conventional/);
    const mixed = run([
      unit({ id: 1, universe: 1, address: 3 }),
      unit({ id: 2, universe: 1, address: 3, fixtureTypeId: 9, loadKind: "switch-mode" }),
    ]);
    expect(mixed.findings.filter((f) => f.severity === "error")).toHaveLength(2);
  });

  it("units in different universes never overlap, and brute force agrees on the used slots", () => {
    const fixtures = Array.from({ length: 60 }, (_, i) =>
      unit({
        id: i + 1,
        universe: 1 + (i % 3),
        address: 1 + ((i * 37) % 500),
        footprint: 1 + (i % 9),
        fixtureTypeId: 100 + i,
        loadKind: "switch-mode",
      }),
    );
    const r = run(fixtures);
    let clashes = 0;
    // Independent reference: count slot users one by one
    for (const u of [1, 2, 3]) {
      const users = new Array(513).fill(0);
      for (const f of fixtures.filter((f) => f.universe === u))
        for (let s = f.address!; s < f.address! + f.footprint!; s++) if (s <= 512) users[s]++;
      const map = r.universes.find((m) => m.universe === u)!;
      expect(map.slotsUsed).toBe(users.filter((n) => n > 0).length);
      // Every unit here is its own type, so any two that share a slot conflict (checked pair by pair)
      const mine = fixtures.filter((f) => f.universe === u);
      const clash = new Set<number>();
      for (const a of mine)
        for (const b of mine)
          if (a !== b && a.address! <= b.address! + b.footprint! - 1 && b.address! <= a.address! + a.footprint! - 1)
            clash.add(a.id);
      const flagged = new Set(
        r.findings
          .filter((f) => f.severity === "error" && f.subject.startsWith(`Universe ${u},`))
          .flatMap((f) => f.fixtureIds ?? []),
      );
      expect(flagged).toEqual(clash);
      clashes += clash.size;
    }
    expect(clashes).toBeGreaterThan(0); // the sample must contain some overlaps to test anything
  });
});

describe("lists", () => {
  it("lists unpatched units and channels the cues use with no fixture", () => {
    const r = run([unit({ id: 1, channel: 5 }), unit({ id: 2, channel: 6, universe: 1, address: 1 })], {
      cueChannels: [5, 6, 7, 7, 40],
    });
    expect(r.unpatched.map((u) => u.id)).toEqual([1]);
    expect(r.channelsWithoutFixture).toEqual([7, 40]);
  });

  it("a patched unit with no known footprint is said, not silently dropped", () => {
    const r = run([unit({ id: 3, universe: 1, address: 1, footprint: null })]);
    expect(r.findings.some((f) => f.severity === "warning" && /footprint is not known/.test(f.message))).toBe(true);
  });
});

describe("data lines", () => {
  it("32 devices is within the EIA-485 limit, 33 is not; the last device gets the terminate reminder", () => {
    // EIA-485: 32 unit loads per segment (from memory)
    expect(UNIT_LOADS_PER_SEGMENT).toBe(32);
    const fixtures = Array.from({ length: 33 }, (_, i) => unit({ id: i + 1, label: `${i + 1}` }));
    const line = (n: number) => [
      { id: 1, name: "SL run", universe: null, fixtureIds: fixtures.slice(0, n).map((f) => f.id) },
    ];
    const ok = run(fixtures, { dataLines: line(32) });
    expect(ok.dataLines[0]).toMatchObject({ devices: 32, overLimit: false, lastDevice: "unit 32" });
    expect(ok.findings.filter((f) => f.severity === "error")).toEqual([]);
    expect(ok.findings.find((f) => /Terminate/.test(f.message))?.fixtureIds).toEqual([32]);
    const over = run(fixtures, { dataLines: line(33) });
    expect(over.dataLines[0].overLimit).toBe(true);
    expect(over.findings.filter((f) => f.severity === "error")[0].message).toMatch(/33 devices/);
  });

  it("the cells of one multi-cell body count as one device", () => {
    const cells = [1, 2, 3, 4].map((i) => unit({ id: i, bodyKey: "batten-A" }));
    const r = run(cells, { dataLines: [{ id: 1, name: "cyc", universe: null, fixtureIds: [1, 2, 3, 4] }] });
    expect(r.dataLines[0].devices).toBe(1);
  });
});
