// The rig's columns, shared by the table on screen and the exports, so a file written from any view
// maps itself back on import. The stored columns are the field registry's (lib/rig/fixture-fields.ts),
// in its order; the computed ones follow. Values are SI; `exportValue` converts lengths to the
// production's unit and says so in the header.
import type { FixtureDto } from "@/lib/dto/fixture";
import type { ImportKey } from "@/lib/io/fields";
import { FIXTURE_FIELDS, type FileField } from "@/lib/rig/fixture-fields";
import { METRES_PER_FOOT } from "@/lib/optics";

export type Units = "metric" | "imperial";
export type ColumnKind = "text" | "int" | "length" | "angle" | "number" | "bool";
export type RigColumn = {
  id: string;
  header: string;
  kind: ColumnKind;
  importKey?: ImportKey; // absent: computed, never read back
  /** The model attribute an edit of this column writes; absent: computed. */
  attribute?: string;
  /** Shown after the header in files: "%" for the iris; lengths and angles get theirs from `kind`. */
  unit?: string;
  width: number;
  value: (f: FixtureDto) => string | number | boolean | null;
};

// Names, unit numbers and deck/head read and edit as text.
const COLUMN_KIND: Record<FileField["kind"], ColumnKind> = {
  name: "text",
  optionalName: "text",
  unit: "text",
  text: "text",
  aim: "text",
  int: "int",
  number: "number",
  length: "length",
  angle: "angle",
  bool: "bool",
};

function storedColumn(f: FileField): RigColumn {
  // A row named by its name shows the name (the DTO's positionName …), not the stored id.
  const read = "shows" in f ? f.shows : f.attribute;
  return {
    id: f.key,
    header: f.header,
    kind: COLUMN_KIND[f.kind],
    importKey: f.key,
    attribute: f.attribute,
    unit: f.unit === "%" ? "%" : undefined,
    width: f.width,
    value: (fx) => (fx as unknown as Record<string, string | number | boolean | null>)[read] ?? null,
  };
}

const col = (id: string, header: string, kind: ColumnKind, value: RigColumn["value"], width = 10): RigColumn => ({
  id,
  header,
  kind,
  value,
  width,
});
const pool = (f: FixtureDto, plane: "deck" | "head") => (f.computed[plane]?.status === "ok" ? f.computed[plane] : null);

export const RIG_COLUMNS: RigColumn[] = [
  ...FIXTURE_FIELDS.filter((f): f is FileField => f.width !== null).map(storedColumn),
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
  if (c.unit) return `${c.header} (${c.unit})`;
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

/**
 * The value in effect where a unit stores none of its own: the type's widest cone and default softness,
 * or the lens height the position's trim gives. The table shows it marked as inherited; exports keep the
 * stored (empty) value so a file still reads back as "use the default".
 */
export type Inherited = { value: number; from: "type" | "trim" };
export function inheritedValue(columnId: string, f: FixtureDto): Inherited | null {
  const g = f.computed;
  if (columnId === "coneDeg" && g.coneIsDefault) return { value: g.coneDeg, from: "type" };
  if (columnId === "softnessDeg" && g.softnessIsDefault) return { value: g.softnessDeg, from: "type" };
  if (columnId === "lensHeight" && g.lensHeightIsDefault) return { value: g.lensHeight, from: "trim" };
  return null;
}
