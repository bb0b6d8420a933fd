// The rig's columns, shared by the table on screen and the exports, so a file written from any view
// maps itself back on import. Values are SI; `exportValue` converts lengths to the production's unit
// and says so in the header.
import type { FixtureDto } from "@/lib/data/fixtures";
import type { ImportKey } from "@/lib/io/fields";
import { METRES_PER_FOOT } from "@/lib/optics";

export type Units = "metric" | "imperial";
export type ColumnKind = "text" | "int" | "length" | "angle" | "number" | "bool";
export type RigColumn = {
  id: string;
  header: string;
  kind: ColumnKind;
  importKey?: ImportKey; // absent: computed, never read back
  width: number;
  value: (f: FixtureDto) => string | number | boolean | null;
};

const col = (id: string, header: string, kind: ColumnKind, value: RigColumn["value"], width = 10, importKey?: ImportKey): RigColumn => ({ id, header, kind, value, width, importKey });
const stored = <K extends keyof FixtureDto>(key: K & ImportKey, header: string, kind: ColumnKind, width = 10) =>
  col(key, header, kind, (f) => f[key] as string | number | boolean | null, width, key);
const pool = (f: FixtureDto, plane: "deck" | "head") => (f.computed[plane]?.status === "ok" ? f.computed[plane] : null);

export const RIG_COLUMNS: RigColumn[] = [
  col("position", "Position", "text", (f) => f.positionName, 18, "position"),
  col("unitNumber", "Unit", "text", (f) => f.unitNumber, 7, "unitNumber"),
  col("type", "Type", "text", (f) => f.typeName, 22, "type"),
  stored("channel", "Channel", "int", 9),
  stored("universe", "Universe", "int", 9),
  stored("address", "Address", "int", 9),
  stored("dmxMode", "Mode", "text", 10),
  stored("footprint", "Footprint", "int", 10),
  stored("circuit", "Circuit", "text", 9),
  stored("dimmer", "Dimmer", "text", 9),
  stored("colour", "Colour", "text", 14),
  stored("gobo", "Gobo", "text", 12),
  stored("purpose", "Purpose", "text", 18),
  stored("x", "X", "length", 9),
  stored("y", "Y", "length", 9),
  stored("lensHeight", "Lens height", "length", 12),
  col("focusPoint", "Focus point", "text", (f) => f.focusPointName, 12, "focusPoint"),
  stored("focusX", "Focus X", "length", 10),
  stored("focusY", "Focus Y", "length", 10),
  stored("aim", "Aim at", "text", 8),
  stored("coneDeg", "Cone", "angle", 8),
  stored("softnessDeg", "Softness", "angle", 9),
  stored("irisPercent", "Iris", "number", 7),
  stored("goboRotationDeg", "Gobo rotation", "angle", 10),
  stored("barnDoorTop", "Barn door top", "text", 14),
  stored("barnDoorBottom", "Barn door bottom", "text", 14),
  stored("barnDoorLeft", "Barn door left", "text", 14),
  stored("barnDoorRight", "Barn door right", "text", 14),
  stored("hung", "Hung", "bool", 7),
  stored("focused", "Focused", "bool", 8),
  stored("notes", "Notes", "text", 24),
  stored("focusNotes", "As-focused notes", "text", 24),
  stored("bodyKey", "Body", "text", 8),
  stored("cell", "Cell", "int", 6),
  col("throw", "Throw", "length", (f) => f.computed.throw, 9),
  col("deckLength", "Deck pool length", "length", (f) => pool(f, "deck")?.lengthAlong ?? null, 12),
  col("deckWidth", "Deck pool width", "length", (f) => pool(f, "deck")?.widthAcross ?? null, 12),
  col("headLength", "Head pool length", "length", (f) => pool(f, "head")?.lengthAlong ?? null, 12),
  col("headWidth", "Head pool width", "length", (f) => pool(f, "head")?.widthAcross ?? null, 12),
  col("softBandFar", "Soft band far", "length", (f) => pool(f, "deck")?.band?.far ?? null, 11),
];

export const COLUMN_BY_ID = new Map(RIG_COLUMNS.map((c) => [c.id, c]));

/** "X (m)", "Cone (°)": the unit travels with the header so a file is unambiguous on its own. */
export function headerWithUnit(c: RigColumn, units: Units): string {
  if (c.kind === "length") return `${c.header} (${units === "metric" ? "m" : "ft"})`;
  if (c.kind === "angle") return `${c.header} (°)`;
  if (c.id === "irisPercent") return `${c.header} (%)`;
  return c.header;
}

// 0.1 mm in metres and about 0.004 mm in feet: far finer than a tape measure, coarse enough to read.
const round = (n: number, places: number) => Math.round(n * 10 ** places) / 10 ** places;

export function exportValue(c: RigColumn, f: FixtureDto, units: Units): string | number | boolean | null {
  const v = c.value(f);
  if (typeof v !== "number") return v;
  if (c.kind === "length") return units === "metric" ? round(v, 4) : round(v / METRES_PER_FOOT, 5);
  if (c.kind === "angle" || c.kind === "number") return round(v, 4);
  return v;
}
