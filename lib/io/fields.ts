// The fixture fields a file's columns can map to, with the header words we recognise for each: the
// registry's fields that have a column (lib/rig/fixture-fields.ts). Export writes exactly these headers
// (plus units), so an exported file maps itself on re-import.
import { FIXTURE_FIELDS, type FileField } from "@/lib/rig/fixture-fields";

export type ImportKey = FileField["key"];
export type FieldKind = FileField["kind"];
export type ColumnTarget = ImportKey | "ignore";
export type ImportField = {
  key: ImportKey;
  attribute: string;
  header: string;
  kind: FieldKind;
  aliases: readonly string[];
};

export const IMPORT_FIELDS: readonly ImportField[] = FIXTURE_FIELDS.filter((f): f is FileField => f.width !== null).map(
  (f) => ({
    key: f.key,
    attribute: f.attribute,
    header: f.header,
    kind: f.kind,
    aliases: f.aliases,
  }),
);

/** Computed values that exports carry; recognised on the way back in and left alone. */
export const COMPUTED_HEADERS = [
  "Throw",
  "Tilt",
  "Deck pool length",
  "Deck pool width",
  "Head pool length",
  "Head pool width",
  "Soft band far",
  "Soft band near",
];

export const FIELD_BY_KEY: ReadonlyMap<ImportKey, ImportField> = new Map(IMPORT_FIELDS.map((f) => [f.key, f]));

/** "X (m)" → "x"; "Unit #" → "unit #"; case and spacing do not matter. */
export function normaliseHeader(header: string): string {
  return header
    .toLowerCase()
    .replace(/\((?:m|ft|°|deg|%|metres|meters|feet)\)/g, "")
    .replace(/[_\s]+/g, " ")
    .replace(/[:.]$/, "")
    .trim();
}

const LOOKUP = new Map<string, ImportKey | "ignore">();
for (const f of IMPORT_FIELDS) for (const name of [f.header, ...f.aliases]) LOOKUP.set(normaliseHeader(name), f.key);
for (const h of COMPUTED_HEADERS) LOOKUP.set(normaliseHeader(h), "ignore");

/** The unit written in a header's parentheses, if any: "X (ft)" → "ft". */
export function headerUnit(header: string): "m" | "ft" | null {
  const m = header.toLowerCase().match(/\((m|metres|meters|ft|feet)\)/);
  if (!m) return null;
  return m[1].startsWith("m") ? "m" : "ft";
}

/**
 * Maps each header to a field: the production's remembered choice first, then our header words.
 * A field is mapped at most once (the first column wins); later copies are ignored.
 */
/* `remembered` is keyed by normaliseHeader(header). */
export function suggestMapping(headers: string[], remembered: Record<string, ColumnTarget> = {}): ColumnTarget[] {
  const taken = new Set<ImportKey>();
  return headers.map((h) => {
    const norm = normaliseHeader(h);
    const guess = remembered[norm] ?? LOOKUP.get(norm) ?? "ignore";
    if (guess === "ignore" || taken.has(guess)) return "ignore";
    taken.add(guess);
    return guess;
  });
}

/** True when a row of cells looks like our header (used to pick a sheet in a workbook). */
export function looksLikeFixtureHeader(cells: string[]): boolean {
  const keys = new Set(cells.map((c) => LOOKUP.get(normaliseHeader(c))).filter((k) => k && k !== "ignore"));
  return keys.has("position") && keys.has("unitNumber");
}
