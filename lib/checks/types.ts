// Shapes shared by the three checks (DMX data, power, rigging). Pure data: no I/O, no React.

/** error: must be fixed; warning: look at it; info: listed so nothing is silently left out. */
export type Severity = "error" | "warning" | "info";

export type CheckArea = "dmx" | "power" | "rigging";

/** One line of the findings list: what is wrong, on what, in plain words. */
export type Finding = {
  area: CheckArea;
  severity: Severity;
  /** What the finding is about, as the user names it: "Unit 12 (1st electric)", "Circuit 14", "Universe 2". */
  subject: string;
  message: string;
  /** Fixture ids concerned, so the plot and the rig table can badge them. */
  fixtureIds?: number[];
  /** What a unit's badge says about it ("circuit 14 over its rating"); info findings badge a unit only with one. */
  unitNote?: string;
  /** Stable anchor of the finding's row on the checks page (set by runChecks). */
  key?: string;
};

/** A fixture as the checks see it: identity, type facts and its DMX and power fields. */
export type CheckFixture = {
  id: number;
  /** "12 (1st electric)": unit number and position, for messages. */
  label: string;
  positionId: number;
  fixtureTypeId: number;
  typeName: string;
  dmxMode: string | null;
  universe: number | null;
  address: number | null;
  /** Slots taken; null when neither the fixture nor its type's mode says. */
  footprint: number | null;
  channel: number | null;
  circuit: string | null;
  dimmer: string | null;
  /** Watts (or VA for switch-mode loads) from the type; null when not entered. */
  wattage: number | null;
  /** Kilograms from the type; null when not entered. */
  weightKg: number | null;
  loadKind: LoadKind;
  /** "set" on the type, or read from its "family" because the type does not say (lib/checks/load-kind.ts). */
  loadKindSource?: "set" | "family";
  /** Multi-cell bodies: one row per cell, one body. The body's weight is counted once. */
  bodyKey: string | null;
};

/**
 * lamp: a resistive incandescent or tungsten-halogen lamp, fine on a dimmer.
 * switch-mode: an electronic power supply (LED units, moving lights, discharge lamps): it must have
 * constant power, and its current is VA / V rather than W / V.
 */
export type LoadKind = "lamp" | "switch-mode";

/** An accessory hung on a fixture, with its own DMX and weight. */
export type CheckAccessory = {
  id: number;
  fixtureId: number;
  kind: string;
  universe: number | null;
  address: number | null;
  footprint: number | null;
  /** Watts (VA) entered for it; null when not entered. Only powered kinds need one (see accessory-power.ts). */
  wattage: number | null;
  weightKg: number | null;
};
