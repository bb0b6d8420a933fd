import type { AreaCoverage, DimmerCurve } from "@/lib/optics";

export type PerformerMarkDto = {
  id: number;
  productionId: number;
  name: string;
  x: number;
  y: number;
  height: number;
  shoulderWidth: number;
  version: number;
  updatedAt: string;
};
export type ScenicPanelDto = {
  id: number;
  productionId: number;
  name: string;
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  height: number;
  version: number;
  updatedAt: string;
};
export type ColourTransmissionDto = {
  id: number;
  productionId: number;
  name: string;
  percent: number;
  version: number;
  updatedAt: string;
};

/** A unit that gives light in the study, as the browser needs it to draw, recompute shadows and name keys. */
export type StudyLight = {
  fixtureId: number;
  unitLabel: string;
  channel: number | null;
  source: { x: number; y: number; z: number };
  focus: { x: number; y: number; z: number };
  coneDeg: number;
  softnessDeg: number;
  family: string;
  apertureDiameter: number;
  peakCandela: number;
  /** Level in the chosen state, 0–100, and the share of full output after the curve and the colour. */
  level: number;
  output: number;
  curve: DimmerCurve;
  colour: string | null;
  /** Colours without a transmission in the production's list (counted at 100 %). */
  missingColours: string[];
};

/** A grid as sent: float32 cells in base64 (row-major, rows upstage from originY). */
export type GridWire = {
  cols: number;
  rows: number;
  resolution: number;
  originX: number;
  originY: number;
  min: number;
  mean: number;
  max: number;
  values: string;
  /** Face light: the key's index in `lights` per cell (int32, −1 when dark) and its lux (float32). */
  key?: string;
  keyLux?: string;
};

export type CoverageResult = {
  measure: { kind: "deck" | "head" | "face"; planeHeight: number; facingDeg: number | null };
  deckHeight: number;
  grid: GridWire;
  areas: AreaCoverage[];
  lights: StudyLight[];
  curves: DimmerCurve[];
  warnings: string[];
  /** Milliseconds spent computing the grid on the server (the rest is reading and sending). */
  computeMs: number;
};

export type FixtureShadow = {
  fixtureId: number;
  unitLabel: string;
  lands: "deck" | "wall" | "unbounded" | "none";
  reason: string | null;
  length: number | null;
  wallHeight: number | null;
  penumbraWidth: number | null;
  umbraWidth: number | null;
  /** Plan outlines on the deck (deck coordinates), empty when the shadow does not close on the deck. */
  umbra: Array<{ x: number; y: number }>;
  penumbra: Array<{ x: number; y: number }>;
};

export type OccluderShadows = { kind: "performer" | "panel"; id: number; name: string; shadows: FixtureShadow[] };
export type ShadowResult = {
  occluders: OccluderShadows[];
  lights: StudyLight[];
  backWallY: number;
  deckHeight: number;
  warnings: string[];
};
