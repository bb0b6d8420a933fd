// The editable figures of a fixture type as text in a table cell, and back: the types table shows each
// figure in words a user types ("15–30" for a zoom, "dimmer 1, extended 4" for DMX modes), and a typed
// cell becomes a patch checked by the API's own schema, so the table cannot send what the API refuses.
import { fixtureTypeFieldsSchema } from "@/lib/validation/rig";
import { FIXTURE_FAMILIES, formatLength, fromDatasheet, parseLength, type Family } from "@/lib/optics";
import { FLAT_TENTH_ACROSS_BAND } from "@/lib/optics/profile";
import type { FixtureTypeDto } from "@/lib/dto/fixture-type";
import { FIXTURE_MOUNTINGS, MOUNTING_LABELS, mountingFromText } from "./mounting";

export type TypeColumn = {
  key: string;
  header: string;
  fields: Array<keyof FixtureTypeDto>;
  kind:
    | "text"
    | "cone"
    | "number"
    | "optionalNumber"
    | "datasheet"
    | "modes"
    | "length"
    | "optionalText"
    | "choice"
    | "readOnly";
  /** The values a "choice" column offers, with their words. */
  choices?: ReadonlyArray<{ value: string; label: string }>;
};

export const TYPE_COLUMNS: TypeColumn[] = [
  { key: "name", header: "Name", fields: ["name"], kind: "text" },
  { key: "family", header: "Family", fields: ["family"], kind: "readOnly" },
  { key: "cone", header: "Cone (°)", fields: ["coneMinDeg", "coneMaxDeg"], kind: "cone" },
  { key: "defaultSoftnessDeg", header: "Softness (°)", fields: ["defaultSoftnessDeg"], kind: "number" },
  // A datasheet's beam (50 %) and field (10 %) angles, mapped onto the cone and softness (docs/optics.md).
  {
    key: "datasheet",
    header: "Beam / field (°)",
    fields: ["coneMinDeg", "coneMaxDeg", "defaultSoftnessDeg"],
    kind: "datasheet",
  },
  // A zoom brightens as it narrows: its peak at each end of the range (one figure for a fixed-angle type).
  { key: "peakCandela", header: "Peak at widest (cd)", fields: ["peakCandela"], kind: "number" },
  { key: "peakCandelaNarrow", header: "Peak at narrowest (cd)", fields: ["peakCandelaNarrow"], kind: "optionalNumber" },
  { key: "wattage", header: "Power (W)", fields: ["wattage"], kind: "number" },
  { key: "weightKg", header: "Weight (kg)", fields: ["weightKg"], kind: "number" },
  // lamp or switch-mode; empty leaves it to the family (the power check says which it used).
  { key: "loadKind", header: "Load", fields: ["loadKind"], kind: "optionalText" },
  { key: "dmxModes", header: "DMX modes (slots)", fields: ["dmxModes"], kind: "modes" },
  { key: "frameSize", header: "Frame", fields: ["frameSize"], kind: "optionalText" },
  { key: "goboSize", header: "Gobo", fields: ["goboSize"], kind: "optionalText" },
  // Where the lens sits against the trim (lib/rig/fixture-geometry.ts): the drop counts under-hung, the rise
  // over-hung and on the floor; a side arm holds the lens level with the pipe.
  {
    key: "mounting",
    header: "Mounting",
    fields: ["mounting"],
    kind: "choice",
    choices: FIXTURE_MOUNTINGS.map((m) => ({ value: m, label: MOUNTING_LABELS[m] })),
  },
  { key: "lensDropM", header: "Lens drop", fields: ["lensDropM"], kind: "length" },
  { key: "lensRiseM", header: "Lens rise", fields: ["lensRiseM"], kind: "length" },
  // The room one unit takes on a pipe, centre to centre: units placed on the plot are spaced by it.
  { key: "bodyWidthM", header: "Body width", fields: ["bodyWidthM"], kind: "length" },
  { key: "cells", header: "Cells", fields: ["cells"], kind: "number" },
];

export function typeCellText(t: FixtureTypeDto, column: TypeColumn, units: "metric" | "imperial"): string {
  switch (column.kind) {
    case "cone":
      return t.coneMinDeg === t.coneMaxDeg ? String(t.coneMinDeg) : `${t.coneMinDeg}–${t.coneMaxDeg}`;
    case "modes":
      return t.dmxModes.map((m) => `${m.name} ${m.footprint}`).join(", ");
    case "length":
      return formatLength(t[column.fields[0]] as number, units);
    case "choice":
      return column.choices?.find((c) => c.value === t[column.fields[0]])?.label ?? String(t[column.fields[0]]);
    case "datasheet": {
      // The model's own 50 % and 10 % full angles at the widest cone, as a datasheet would print them.
      const s = Math.min(t.defaultSoftnessDeg, t.coneMaxDeg / 2);
      const flat = familyOf(t.family) === "flat";
      const field = flat ? t.coneMaxDeg - 2 * (1 - FLAT_TENTH_ACROSS_BAND) * s : t.coneMaxDeg;
      return `${round(t.coneMaxDeg - s, 1)} / ${round(field, 1)}`;
    }
    default: {
      const v = t[column.fields[0]];
      return v === null || v === undefined ? "" : String(v);
    }
  }
}

export type CellParse = { ok: true; patch: Record<string, unknown> } | { ok: false; message: string };

const round = (v: number, places: number) => Math.round(v * 10 ** places) / 10 ** places;

function familyOf(family: string): "flat" | "peaked" {
  return FIXTURE_FAMILIES.find((f) => f.value === family)?.shape ?? "flat";
}

/** "22 / 30" → cone and softness for the type's family; a zoom's figures set its widest end. */
function datasheetPatch(
  text: string,
  header: string,
  type: Pick<FixtureTypeDto, "family" | "coneMinDeg" | "coneMaxDeg"> | undefined,
): CellParse {
  const m = /^\s*(\d+(?:[.,]\d+)?)\s*°?\s*[/,]\s*(\d+(?:[.,]\d+)?)\s*°?\s*$/.exec(text);
  if (!m || !type) return { ok: false, message: `${header}: write the beam and field angles, e.g. "22 / 30"` };
  const known = FIXTURE_FAMILIES.some((f) => f.value === type.family);
  const d = fromDatasheet({
    beamDeg: Number(m[1].replace(",", ".")),
    fieldDeg: Number(m[2].replace(",", ".")),
    family: (known ? type.family : "profile") as Family,
  });
  const cone = round(d.coneDeg, 2);
  const fixed = type.coneMinDeg === type.coneMaxDeg || cone < type.coneMinDeg;
  return {
    ok: true,
    patch: { ...(fixed ? { coneMinDeg: cone } : {}), coneMaxDeg: cone, defaultSoftnessDeg: round(d.softnessDeg, 2) },
  };
}

function number(text: string, header: string): number | string {
  const n = Number(text.trim().replace(",", "."));
  return text.trim() === "" || Number.isNaN(n) ? `${header}: "${text}" is not a number` : n;
}

/** Reads a typed cell into a patch, checked by the fixture-type schema; the message names the column. */
export function parseTypeCell(
  column: TypeColumn,
  text: string,
  units: "metric" | "imperial",
  type?: Pick<FixtureTypeDto, "family" | "coneMinDeg" | "coneMaxDeg">,
): CellParse {
  const header = column.header;
  let patch: Record<string, unknown>;
  try {
    switch (column.kind) {
      case "cone": {
        const parts = text
          .split(/\s*[–—-]\s*|\s+to\s+/)
          .filter(Boolean)
          .map((p) => number(p.replace("°", ""), header));
        const bad = parts.find((p) => typeof p === "string");
        if (bad) return { ok: false, message: bad as string };
        if (parts.length < 1 || parts.length > 2)
          return { ok: false, message: `${header}: write one angle (26) or a zoom range (15–30)` };
        patch = { coneMinDeg: parts[0], coneMaxDeg: parts[parts.length - 1] };
        if ((parts[0] as number) > (parts[parts.length - 1] as number))
          return { ok: false, message: `${header}: the narrowest cone comes first` };
        break;
      }
      case "modes": {
        const modes = text
          .split(",")
          .map((m) => m.trim())
          .filter(Boolean)
          .map((m) => {
            const match = /^(.*?)\s*\(?(\d+)\)?$/.exec(m);
            return match && match[1] ? { name: match[1], footprint: Number(match[2]) } : null;
          });
        if (!modes.length || modes.some((m) => m === null))
          return {
            ok: false,
            message: `${header}: write each mode as a name and its slots, e.g. "dimmer 1, extended 4"`,
          };
        patch = { dmxModes: modes };
        break;
      }
      case "number": {
        const n = number(text, header);
        if (typeof n === "string") return { ok: false, message: n };
        patch = { [column.fields[0]]: n };
        break;
      }
      case "datasheet": {
        const r = datasheetPatch(text, header, type);
        if (!r.ok) return r;
        patch = r.patch;
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
        patch = { [column.fields[0]]: parseLength(text, units === "imperial" ? "ft" : "m") };
        break;
      case "choice": {
        const value = column.key === "mounting" ? mountingFromText(text) : null;
        if (!value)
          return {
            ok: false,
            message: `${header}: choose one of ${(column.choices ?? []).map((c) => c.label).join(", ")}`,
          };
        patch = { [column.fields[0]]: value };
        break;
      }
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
