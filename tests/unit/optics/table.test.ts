// The grid's profile table (lib/optics/profile-table.ts) against the exact curves.
import { describe, expect, it } from "vitest";
import { makeProfile, profileAt } from "@/lib/optics/profile";
import { profileTable, tableAt } from "@/lib/optics/profile-table";
import { beamAngles } from "@/lib/optics/validate";

describe("profile table", () => {
  const cases: Array<[number, number]> = [
    [2, 0.5],
    [10, 0],
    [19, 3],
    [30, 0.01],
    [30, 0.3],
    [36, 8],
    [50, 20],
    [90, 45],
    [170, 85],
  ];
  it.each(cases)("cone %f°, softness %f°: within 2e-4 of the exact flat and peaked curves", (cone, soft) => {
    // DESIGN.md: the profile-spot formula; lib/optics/profile.ts: the peaked curve (exact closed forms)
    for (const shape of ["flat", "peaked"] as const) {
      const p = makeProfile(beamAngles(cone, soft), shape);
      const t = profileTable(p);
      let worst = 0;
      for (let k = 0; k <= 5000; k++) {
        const beta = (p.outer * k) / 5000;
        worst = Math.max(worst, Math.abs(tableAt(t, Math.cos(beta)) - profileAt(p, beta)));
      }
      expect(worst).toBeLessThan(2e-4);
      expect(tableAt(t, 1)).toBe(1);
    }
  });
});
