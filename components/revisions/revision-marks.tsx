// Throwline's own "changed since the last revision" mark and the revision stamp that prints carry.
// The mark is a bar down the row's leading edge in the caution colour (a border, so it prints), with the
// words for screen readers and a tooltip; the stamp is one line: "Revision B · for focus · 5 Dec 2026".
import type { RevisionStamp } from "@/lib/revisions/types";

/** Classes for the first cell of a changed row. */
export const CHANGED_EDGE = "border-l-[5px] border-l-caution print:border-l-black";

export function ChangedWords({ label }: { label: string }) {
  return <span className="sr-only">Changed since revision {label}.</span>;
}

export function revisionStampText(stamp: RevisionStamp | null): string {
  if (!stamp) return "No revision issued";
  const day = new Date(stamp.issuedAt).toLocaleDateString("en-GB", {
    day: "numeric",
    month: "short",
    year: "numeric",
    timeZone: "UTC",
  });
  return `Revision ${stamp.label} · for ${stamp.issuedFor} · ${day}`;
}

export function RevisionStampLine({ stamp, className = "" }: { stamp: RevisionStamp | null; className?: string }) {
  return (
    <span className={`text-xs ${className}`} data-testid="revision-stamp">
      {revisionStampText(stamp)}
    </span>
  );
}

/** A note under a table saying what the bar means, only when something is marked. */
export function ChangedKey({ label, count }: { label: string; count: number }) {
  if (!count) return null;
  return (
    <p className="flex items-center gap-2 text-xs text-muted">
      <span aria-hidden className="inline-block h-3 w-[5px] bg-caution print:bg-black" />
      {count} changed since revision {label}
    </p>
  );
}
