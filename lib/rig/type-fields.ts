// The editable figures of a fixture type as text in a table cell, and back: the types table shows each
// figure in words a user types ("15–30" for a zoom, "dimmer 1, extended 4" for DMX modes), and a typed
// cell becomes a patch checked by the API's own schema, so the table cannot send what the API refuses.
import { fixtureTypeFieldsSchema } from "@/lib/validation/rig";
import { formatLength, parseLength } from "@/lib/optics";
import type { FixtureTypeDto } from "@/lib/dto/fixture-type";

export type TypeColumn = { key: string; header: string; fields: Array<keyof FixtureTypeDto>; kind: "text" | "cone" | "number" | "optionalNumber" | "modes" | "length" | "optionalText" | "readOnly" };

export const TYPE_COLUMNS: TypeColumn[] = [
  { key: "name", header: "Name", fields: ["name"], kind: "text" },
  { key: "family", header: "Family", fields: ["family"], kind: "readOnly" },
  { key: "cone", header: "Cone (°)", fields: ["coneMinDeg", "coneMaxDeg"], kind: "cone" },
  { key: "defaultSoftnessDeg", header: "Softness (°)", fields: ["defaultSoftnessDeg"], kind: "number" },
  // A zoom brightens as it narrows: its peak at each end of the range (one figure for a fixed-angle type).
  { key: "peakCandela", header: "Peak at widest (cd)", fields: ["peakCandela"], kind: "number" },
  { key: "peakCandelaNarrow", header: "Peak at narrowest (cd)", fields: ["peakCandelaNarrow"], kind: "optionalNumber" },
  { key: "wattage", header: "Power (W)", fields: ["wattage"], kind: "number" },
  { key: "weightKg", header: "Weight (kg)", fields: ["weightKg"], kind: "number" },
  { key: "dmxModes", header: "DMX modes (slots)", fields: ["dmxModes"], kind: "modes" },
  { key: "frameSize", header: "Frame", fields: ["frameSize"], kind: "optionalText" },
  { key: "goboSize", header: "Gobo", fields: ["goboSize"], kind: "optionalText" },
  { key: "lensDropM", header: "Lens drop", fields: ["lensDropM"], kind: "length" },
  { key: "cells", header: "Cells", fields: ["cells"], kind: "number" },
];

export function typeCellText(t: FixtureTypeDto, column: TypeColumn, units: "metric" | "imperial"): string {
  switch (column.kind) {
    case "cone":
      return t.coneMinDeg === t.coneMaxDeg ? String(t.coneMinDeg) : `${t.coneMinDeg}–${t.coneMaxDeg}`;
    case "modes":
      return t.dmxModes.map((m) => `${m.name} ${m.footprint}`).join(", ");
    case "length":
      return formatLength(t.lensDropM, units);
    default: {
      const v = t[column.fields[0]];
      return v === null || v === undefined ? "" : String(v);
    }
  }
}

export type CellParse = { ok: true; patch: Record<string, unknown> } | { ok: false; message: string };

function number(text: string, header: string): number | string {
  const n = Number(text.trim().replace(",", "."));
  return text.trim() === "" || Number.isNaN(n) ? `${header}: "${text}" is not a number` : n;
}

/** Reads a typed cell into a patch, checked by the fixture-type schema; the message names the column. */
export function parseTypeCell(column: TypeColumn, text: string, units: "metric" | "imperial"): CellParse {
  const header = column.header;
  let patch: Record<string, unknown>;
  try {
    switch (column.kind) {
      case "cone": {
        const parts = text.split(/\s*[–—-]\s*|\s+to\s+/).filter(Boolean).map((p) => number(p.replace("°", ""), header));
        const bad = parts.find((p) => typeof p === "string");
        if (bad) return { ok: false, message: bad as string };
        if (parts.length < 1 || parts.length > 2) return { ok: false, message: `${header}: write one angle (26) or a zoom range (15–30)` };
        patch = { coneMinDeg: parts[0], coneMaxDeg: parts[parts.length - 1] };
        if ((parts[0] as number) > (parts[parts.length - 1] as number)) return { ok: false, message: `${header}: the narrowest cone comes first` };
        break;
      }
      case "modes": {
        const modes = text.split(",").map((m) => m.trim()).filter(Boolean).map((m) => {
          const match = /^(.*?)\s*\(?(\d+)\)?$/.exec(m);
          return match && match[1] ? { name: match[1], footprint: Number(match[2]) } : null;
        });
        if (!modes.length || modes.some((m) => m === null)) return { ok: false, message: `${header}: write each mode as a name and its slots, e.g. "dimmer 1, extended 4"` };
        patch = { dmxModes: modes };
        break;
      }
      case "number": {
        const n = number(text, header);
        if (typeof n === "string") return { ok: false, message: n };
        patch = { [column.fields[0]]: n };
        break;
      }
      case "optionalNumber": {
        if (text.trim() === "") {
          patch = { [column.fields[0]]: null };
          break;
        }
        const n = number(text, header);
        if (typeof n === "string") return { ok: false, message: n };
        patch = { [column.fields[0]]: n };
        break;
      }
      case "length":
        patch = { lensDropM: parseLength(text, units === "imperial" ? "ft" : "m") };
        break;
      case "optionalText":
        patch = { [column.fields[0]]: text.trim() || null };
        break;
      case "text":
        patch = { [column.fields[0]]: text.trim() };
        break;
      default:
        return { ok: false, message: `${header} cannot be edited here` };
    }
  } catch (err) {
    return { ok: false, message: `${header}: ${(err as Error).message}` };
  }
  const checked = fixtureTypeFieldsSchema.partial().safeParse(patch);
  if (!checked.success) return { ok: false, message: `${header}: ${checked.error.issues[0].message}` };
  return { ok: true, patch: checked.data };
}
