// The fixture fields a file's columns can map to, with the header words we recognise for each.
// Export writes exactly these headers (plus units), so an exported file maps itself on re-import.

export const IMPORT_FIELDS = [
  { key: "position", header: "Position", kind: "name", aliases: ["hanging position", "pipe", "location", "pos"] },
  { key: "unitNumber", header: "Unit", kind: "unit", aliases: ["unit number", "unit no", "unit #", "unit no."] },
  { key: "type", header: "Type", kind: "name", aliases: ["fixture type", "instrument type", "fixture", "instrument"] },
  { key: "channel", header: "Channel", kind: "int", aliases: ["chan", "ch"] },
  { key: "universe", header: "Universe", kind: "int", aliases: ["univ", "dmx universe"] },
  { key: "address", header: "Address", kind: "int", aliases: ["dmx address", "addr", "start address", "dmx"] },
  { key: "dmxMode", header: "Mode", kind: "text", aliases: ["dmx mode", "personality"] },
  { key: "footprint", header: "Footprint", kind: "int", aliases: ["slots", "channels used", "dmx footprint"] },
  { key: "circuit", header: "Circuit", kind: "text", aliases: ["circ", "circuit number"] },
  { key: "dimmer", header: "Dimmer", kind: "text", aliases: ["dim", "dimmer number"] },
  { key: "colour", header: "Colour", kind: "text", aliases: ["color", "gel", "colour and diffusion", "color and diffusion"] },
  { key: "gobo", header: "Gobo", kind: "text", aliases: ["pattern", "template"] },
  { key: "purpose", header: "Purpose", kind: "text", aliases: ["use", "function", "focus purpose"] },
  { key: "x", header: "X", kind: "length", aliases: ["x position", "across"] },
  { key: "y", header: "Y", kind: "length", aliases: ["y position", "depth"] },
  { key: "lensHeight", header: "Lens height", kind: "length", aliases: ["height", "z"] },
  { key: "focusPoint", header: "Focus point", kind: "optionalName", aliases: ["focus mark", "area"] },
  { key: "focusX", header: "Focus X", kind: "length", aliases: [] },
  { key: "focusY", header: "Focus Y", kind: "length", aliases: [] },
  { key: "aim", header: "Aim at", kind: "aim", aliases: ["aim", "aim height", "focus height"] },
  { key: "coneDeg", header: "Cone", kind: "angle", aliases: ["cone angle", "beam", "field angle", "zoom"] },
  { key: "softnessDeg", header: "Softness", kind: "angle", aliases: ["edge", "edge softness"] },
  { key: "irisPercent", header: "Iris", kind: "number", aliases: ["iris %"] },
  { key: "goboRotationDeg", header: "Gobo rotation", kind: "angle", aliases: ["gobo angle", "gobo orientation", "gobo rot"] },
  { key: "barnDoorTop", header: "Barn door top", kind: "text", aliases: ["barn doors top", "top barn door", "top door"] },
  { key: "barnDoorBottom", header: "Barn door bottom", kind: "text", aliases: ["barn doors bottom", "bottom barn door", "bottom door"] },
  { key: "barnDoorLeft", header: "Barn door left", kind: "text", aliases: ["barn doors left", "left barn door", "left door"] },
  { key: "barnDoorRight", header: "Barn door right", kind: "text", aliases: ["barn doors right", "right barn door", "right door"] },
  { key: "hung", header: "Hung", kind: "bool", aliases: [] },
  { key: "focused", header: "Focused", kind: "bool", aliases: [] },
  { key: "notes", header: "Notes", kind: "text", aliases: ["note", "comments"] },
  { key: "focusNotes", header: "As-focused notes", kind: "text", aliases: ["focus notes", "as focused"] },
  { key: "bodyKey", header: "Body", kind: "text", aliases: ["body key", "multicell body"] },
  { key: "cell", header: "Cell", kind: "int", aliases: ["cell number"] },
] as const;

export type ImportKey = (typeof IMPORT_FIELDS)[number]["key"];
export type FieldKind = (typeof IMPORT_FIELDS)[number]["kind"];
export type ColumnTarget = ImportKey | "ignore";

/** Computed values that exports carry; recognised on the way back in and left alone. */
export const COMPUTED_HEADERS = ["Throw", "Tilt", "Deck pool length", "Deck pool width", "Head pool length", "Head pool width", "Soft band far", "Soft band near"];

export const FIELD_BY_KEY = new Map(IMPORT_FIELDS.map((f) => [f.key as ImportKey, f]));

/** "X (m)" → "x"; "Unit #" → "unit #"; case and spacing do not matter. */
export function normaliseHeader(header: string): string {
  return header.toLowerCase().replace(/\((?:m|ft|°|deg|%|metres|meters|feet)\)/g, "").replace(/[_\s]+/g, " ").replace(/[:.]$/, "").trim();
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
