// A small starter shelf of generic fixture types a designer can add to a production. The figures are
// typical values from memory for each class of unit, not any manufacturer's data sheet and no brand:
// replace them with the real figures of the units in your stock.
import type { z } from "zod";
import type { createFixtureTypeSchema } from "@/lib/validation/rig";

export type StarterType = z.infer<typeof createFixtureTypeSchema>;

const dimmer = [{ name: "dimmer", footprint: 1 }];

export const STARTER_TYPES: StarterType[] = [
  { name: "Generic profile 19°", family: "profile", coneMinDeg: 19, coneMaxDeg: 19, defaultSoftnessDeg: 2, peakCandela: 60000, wattage: 750, weightKg: 8, dmxModes: dimmer, lensApertureM: 0.15, frameSize: "7.5 in", goboSize: "B", lensDropM: 0.45, cells: 1 },
  { name: "Generic profile 26°", family: "profile", coneMinDeg: 26, coneMaxDeg: 26, defaultSoftnessDeg: 2, peakCandela: 40000, wattage: 750, weightKg: 7.5, dmxModes: dimmer, lensApertureM: 0.13, frameSize: "6.25 in", goboSize: "B", lensDropM: 0.45, cells: 1 },
  { name: "Generic profile 36°", family: "profile", coneMinDeg: 36, coneMaxDeg: 36, defaultSoftnessDeg: 2.5, peakCandela: 25000, wattage: 750, weightKg: 7.3, dmxModes: dimmer, lensApertureM: 0.11, frameSize: "6.25 in", goboSize: "B", lensDropM: 0.45, cells: 1 },
  { name: "Generic zoom profile 25–50°", family: "profile", coneMinDeg: 25, coneMaxDeg: 50, defaultSoftnessDeg: 3, peakCandela: 20000, wattage: 750, weightKg: 9.5, dmxModes: dimmer, lensApertureM: 0.12, frameSize: "6.25 in", goboSize: "B", lensDropM: 0.5, cells: 1 },
  { name: "Generic fresnel 150 mm", family: "fresnel", coneMinDeg: 15, coneMaxDeg: 60, defaultSoftnessDeg: 8, peakCandela: 30000, wattage: 1000, weightKg: 6, dmxModes: dimmer, lensApertureM: 0.15, frameSize: "7.5 in", goboSize: null, lensDropM: 0.35, cells: 1 },
  { name: "Generic PAR, medium flood", family: "par", coneMinDeg: 24, coneMaxDeg: 24, defaultSoftnessDeg: 8, peakCandela: 70000, wattage: 1000, weightKg: 4, dmxModes: dimmer, lensApertureM: 0.18, frameSize: "10 in", goboSize: null, lensDropM: 0.3, cells: 1 },
  {
    name: "Generic LED wash with zoom", family: "led-wash", coneMinDeg: 15, coneMaxDeg: 45, defaultSoftnessDeg: 10, peakCandela: 12000, wattage: 300, weightKg: 9,
    dmxModes: [{ name: "standard", footprint: 8 }, { name: "compact", footprint: 4 }], lensApertureM: 0.2, frameSize: null, goboSize: null, lensDropM: 0.55, cells: 1,
  },
  {
    name: "Generic LED batten, 4 cells", family: "cyc", coneMinDeg: 90, coneMaxDeg: 90, defaultSoftnessDeg: 25, peakCandela: 2500, wattage: 200, weightKg: 7,
    dmxModes: [{ name: "per cell", footprint: 16 }, { name: "whole unit", footprint: 4 }], lensApertureM: 0.3, frameSize: null, goboSize: null, lensDropM: 0.35, cells: 4,
  },
];
