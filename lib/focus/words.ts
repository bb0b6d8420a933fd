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
    day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit", hour12: false, timeZone,
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
