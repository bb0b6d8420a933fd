import { describe, expect, it } from "vitest";
import { exportValue, inheritedValue, COLUMN_BY_ID } from "@/lib/rig/columns";
import { VIEW_BY_ID } from "@/lib/rig/views";
import { makeFixture } from "../focus/fixture-builder";

// The builder's type: cone 19–50°, default softness 2°, lens drop 0.4 m, on a position trimmed at 8 m.
describe("the rig's Focus values show the value in effect", () => {
  it("a unit with no cone, softness or lens height of its own inherits the type's and the trim's", () => {
    const f = makeFixture({ coneDeg: null, softnessDeg: null, lensHeight: null });
    expect(inheritedValue("coneDeg", f)).toEqual({ value: 50, from: "type" }); // the type's widest cone (fixture-geometry's rule)
    expect(inheritedValue("softnessDeg", f)).toEqual({ value: 2, from: "type" });
    // arithmetic: under-hung lens at trim − lens drop = 8 − 0.4 m
    expect(inheritedValue("lensHeight", f)?.value).toBeCloseTo(7.6, 9);
    expect(inheritedValue("lensHeight", f)?.from).toBe("trim");
  });

  it("a unit's own values are not marked inherited, and exports keep the stored empty value", () => {
    const own = makeFixture({ coneDeg: 30, softnessDeg: 4, lensHeight: 6.5 });
    for (const id of ["coneDeg", "softnessDeg", "lensHeight"]) expect(inheritedValue(id, own)).toBeNull();
    const bare = makeFixture({ coneDeg: null });
    expect(exportValue(COLUMN_BY_ID.get("coneDeg")!, bare, "metric")).toBeNull();
  });

  it("the Focus values view has lens height, cone and softness", () => {
    expect(VIEW_BY_ID.get("focus")!.columns).toEqual(expect.arrayContaining(["lensHeight", "coneDeg", "softnessDeg"]));
  });
});
