// Download names for the focus charts' PDF and Excel files: the production, the position when the file
// holds one position only, and the day it was made in the reader's time zone, so a folder of downloads
// sorts and reads without opening them ("salt-and-lantern-1st-electric-focus-charts-2026-12-05.pdf").

const slug = (text: string) =>
  text
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-|-$/g, "")
    .slice(0, 60)
    .replace(/-$/, "");

/** The calendar day of `at` in `timeZone` (the server's own zone when none is given) as YYYY-MM-DD. */
export function isoDay(at: Date, timeZone?: string): string {
  const parts = new Intl.DateTimeFormat("en-GB", {
    timeZone,
    year: "numeric",
    month: "2-digit",
    day: "2-digit",
  }).formatToParts(at);
  const get = (t: string) => parts.find((p) => p.type === t)?.value ?? "";
  return `${get("year")}-${get("month")}-${get("day")}`;
}

export function focusFileName(o: {
  production: string;
  positions: string[];
  at: Date;
  timeZone?: string;
  ext: "pdf" | "xlsx";
}): string {
  const unique = [...new Set(o.positions)];
  const parts = [
    slug(o.production) || "production",
    unique.length === 1 ? slug(unique[0]) : "",
    "focus-charts",
    isoDay(o.at, o.timeZone),
  ];
  return `${parts.filter(Boolean).join("-")}.${o.ext}`;
}
