import { describe, expect, it } from "vitest";
import { addressRun, channelRun } from "@/lib/rig/dmx-ranges";

describe("addressRun", () => {
  it("packs by footprint and moves a unit that would straddle slot 512 to the next universe", () => {
    // ANSI E1.11: (500, 13) fits, ending on 512; a further 13-slot unit cannot start at 513
    expect(addressRun([13, 13], { universe: 1, address: 500 })).toEqual([
      { universe: 1, address: 500 },
      { universe: 2, address: 1 },
    ]);
    // ANSI E1.11: (512, 1) fits; (512, 2) does not
    expect(addressRun([1, 1], { universe: 1, address: 512 })).toEqual([
      { universe: 1, address: 512 },
      { universe: 2, address: 1 },
    ]);
    expect(addressRun([2], { universe: 4, address: 512 })).toEqual([{ universe: 5, address: 1 }]);
    expect(addressRun([8, 8, 4], { universe: 1, address: 1 })).toEqual([
      { universe: 1, address: 1 },
      { universe: 1, address: 9 },
      { universe: 1, address: 17 },
    ]);
  });

  it("refuses a start outside 1–512 and impossible footprints", () => {
    expect(() => addressRun([1], { universe: 1, address: 0 })).toThrow(RangeError); // ANSI E1.11: slots 1–512
    expect(() => addressRun([1], { universe: 1, address: 513 })).toThrow(RangeError);
    expect(() => addressRun([513], { universe: 1, address: 1 })).toThrow(/footprint/);
  });
});

describe("channelRun", () => {
  it("counts up from the start by the step", () => {
    expect(channelRun(4, 101)).toEqual([101, 102, 103, 104]);
    expect(channelRun(3, 10, 10)).toEqual([10, 20, 30]);
  });
});
