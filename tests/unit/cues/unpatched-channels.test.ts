import { describe, expect, it } from "vitest";
import { parseEntry, unpatchedChannels, unpatchedWarning } from "@/lib/cues";

// Channels and levels as typed at the level entry; which channels have units comes from the rig.
describe("typed channels with no unit in the rig", () => {
  const rig = [1, 2, 3, 4, 5, 6, 12, 40];

  it("finds none when every typed channel has a unit", () => {
    const e = parseEntry("1-6 full");
    expect(e.kind === "levels" && unpatchedChannels(e.channels, rig)).toEqual([]);
  });

  it("names a single stray channel (999) and asks for a second Enter", () => {
    const e = parseEntry("999 50");
    const stray = e.kind === "levels" ? unpatchedChannels(e.channels, rig) : [];
    expect(stray).toEqual([999]);
    expect(unpatchedWarning(stray)).toBe(
      "Channel 999 has no unit in the rig. Press Enter again to record it anyway, or change the line.",
    );
  });

  it("lists a range past the rig in its short form with a count", () => {
    const e = parseEntry("38-43 full");
    const stray = e.kind === "levels" ? unpatchedChannels(e.channels, rig) : [];
    expect(stray).toEqual([38, 39, 41, 42, 43]);
    expect(unpatchedWarning(stray)).toBe(
      "Channels 38–39, 41–43 have no unit in the rig (5 channels). Press Enter again to record them anyway, or change the line.",
    );
  });

  it("counts a repeated channel once", () => {
    expect(unpatchedChannels([999, 999, 12], rig)).toEqual([999]);
  });
});
