// How a rig value reads on screen and how typed text becomes a value, per column kind.
import { formatLength, parseAngle, parseLength } from "@/lib/optics";
import { inheritedValue, type ColumnKind, type Units } from "@/lib/rig/columns";
import type { FixtureDto } from "@/lib/dto/fixture";

export function showValue(kind: ColumnKind, v: unknown, units: Units): string {
  if (v === null || v === undefined || v === "") return "";
  if (kind === "length" && typeof v === "number") return formatLength(v, units);
  if (kind === "angle" && typeof v === "number") return `${Number(v.toFixed(1))}°`;
  if (kind === "bool") return v ? "yes" : "no";
  return String(v);
}

/** Text typed into a cell → the value the API takes; throws a RangeError with a readable message. */
export function readTyped(kind: ColumnKind, text: string, units: Units): unknown {
  const t = text.trim();
  if (t === "") return null;
  switch (kind) {
    case "length":
      return parseLength(t, units === "imperial" ? "ft" : "m");
    case "angle":
      return parseAngle(t);
    case "int":
    case "number": {
      const n = Number(t);
      if (!Number.isFinite(n)) throw new RangeError(`"${t}" is not a number`);
      if (kind === "int" && !Number.isInteger(n)) throw new RangeError(`"${t}" is not a whole number`);
      return n;
    }
    default:
      return t;
  }
}

export function editText(kind: ColumnKind, v: unknown, units: Units): string {
  if (v === null || v === undefined) return "";
  if (kind === "length" && typeof v === "number")
    return units === "metric" ? String(Number(v.toFixed(3))) : formatLength(v, units);
  return String(v);
}

/** An empty cell's value in effect ("26° from type"), or null where the unit has none to inherit. */
export function inheritedText(
  kind: ColumnKind,
  columnId: string,
  f: FixtureDto,
  units: Units,
): { text: string; from: string } | null {
  const inherited = inheritedValue(columnId, f);
  if (!inherited) return null;
  return { text: showValue(kind, inherited.value, units), from: inherited.from === "type" ? "from type" : "from trim" };
}
