// Small wording helpers for focus charts: offsets from the mark, pools, bands, time stamps.
import { formatLength, type Point, type Units } from "@/lib/optics";

/** Offset of p from the mark in deck words: "0.35 m US, 0.10 m SL of the mark" or "on the mark". */
export function offsetFromMark(p: Point, mark: Point, units: Units): string {
  const dx = p.x - mark.x;
  const dy = p.y - mark.y;
  const parts: string[] = [];
  const sy = formatLength(Math.abs(dy), units);
  const sx = formatLength(Math.abs(dx), units);
  if (/[1-9]/.test(sy)) parts.push(`${sy} ${dy > 0 ? "US" : "DS"}`);
  if (/[1-9]/.test(sx)) parts.push(`${sx} ${dx > 0 ? "SL" : "SR"}`);
  return parts.length ? `${parts.join(", ")} of the mark` : "on the mark";
}

/** "2 Dec 2026, 14:32" in the given IANA time zone (the reader's, passed from the browser). */
export function formatStamp(isoOrDate: string | Date, timeZone?: string): string {
  const d = typeof isoOrDate === "string" ? new Date(isoOrDate) : isoOrDate;
  return new Intl.DateTimeFormat("en-GB", {
    day: "numeric",
    month: "short",
    year: "numeric",
    hour: "2-digit",
    minute: "2-digit",
    hour12: false,
    timeZone,
  }).format(d);
}

/** True for a time zone name Intl knows. */
export function isTimeZone(tz: string): boolean {
  try {
    new Intl.DateTimeFormat("en-GB", { timeZone: tz });
    return true;
  } catch {
    return false;
  }
}

const deg1 = (v: number) => `${Math.round(v * 10) / 10}°`;

/**
 * A gobo's rotation in the crew's words. Degrees are clockwise, looking along the beam from behind the
 * fixture, 0 = the gobo as drawn. A lens turns the image by 180° (a point inversion), which commutes with a
 * rotation, so turning the gobo clockwise turns the projected image clockwise by the same angle — the
 * words hold for the gobo in the gate and for its image. Past 180° the shorter way round is named.
 */
export function goboRotationWords(deg: number): string {
  const d = (Math.round((((deg % 360) + 360) % 360) * 10) / 10) % 360;
  if (d === 0) return "upright, as drawn (0°)";
  if (d === 180) return "upside down (180°)";
  if (d < 180) return `${deg1(d)} clockwise, looking along the beam`;
  return `${deg1(360 - d)} anticlockwise (${deg1(d)}), looking along the beam`;
}

export type BarnDoorNotes = {
  top?: string | null;
  bottom?: string | null;
  left?: string | null;
  right?: string | null;
};
const LEAVES = ["top", "bottom", "left", "right"] as const;

/**
 * The barn doors as focused, leaf by leaf: "top in halfway · left to the leg". Leaves are named as seen
 * from behind the fixture; the doors sit after the lens, so each leaf cuts its own side of the beam (the
 * top door cuts the top of the beam), unlike a profile's shutters. Null when no leaf has a note.
 */
export function barnDoorWords(d: BarnDoorNotes): string | null {
  const parts = LEAVES.flatMap((leaf) => (d[leaf]?.trim() ? [`${leaf} ${d[leaf]!.trim()}`] : []));
  return parts.length ? parts.join(" · ") : null;
}
