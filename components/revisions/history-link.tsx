// One click from a unit, position, cue or type to its history: who changed which field, when, from what to what.
import Link from "next/link";
import type { HistoryEntity } from "@/lib/revisions/history-lines";

export function HistoryLink({
  productionId,
  entity,
  id,
  name,
  compact = false,
}: {
  productionId: number;
  entity: HistoryEntity;
  id: number;
  /** What the link is the history of, in words: "unit 3 on LX1". */
  name: string;
  compact?: boolean;
}) {
  return (
    <Link
      href={`/productions/${productionId}/history?entity=${entity}&id=${id}`}
      aria-label={`History of ${name}`}
      title={`History of ${name}`}
      className={`inline-flex items-center gap-1 rounded text-xs text-muted hover:text-ink print:hidden pointer-coarse:min-h-11 pointer-coarse:min-w-11 ${compact ? "px-1" : "px-2 py-1 underline"}`}
    >
      <svg aria-hidden viewBox="0 0 16 16" width="14" height="14" fill="none" stroke="currentColor" strokeWidth="1.5">
        <circle cx="8" cy="8" r="6.25" />
        <path d="M8 4.5V8l2.5 1.5" strokeLinecap="round" />
      </svg>
      {compact ? null : "History"}
    </Link>
  );
}
