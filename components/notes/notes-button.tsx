"use client";
// The notes button every fixture, position, cue and focus point carries: it shows the open-note count as a
// badge (from the page's one counts query) and opens that thing's notes with a quick "add note".
import { useState } from "react";
import { useNoteCounts } from "@/hooks/use-note-counts";
import { countFor, noteCountLabel } from "@/lib/notes/counts";
import type { NoteKind } from "@/models/note-vocabulary";
import type { NoteTarget } from "./note-target";
import { TargetNotesDialog } from "./target-notes-dialog";

export function NotesButton({
  productionId,
  target,
  defaultKind,
  compact = false,
  cellControl = false,
  className = "",
}: {
  productionId: number;
  target: NoteTarget;
  defaultKind?: NoteKind;
  /** In a table row: the count alone (or a faint "+") at a cell's height. */
  compact?: boolean;
  /** In the rig table: the control the arrow keys land on in its cell. */
  cellControl?: boolean;
  className?: string;
}) {
  const { data: counts } = useNoteCounts(productionId);
  const [open, setOpen] = useState(false);
  const count = countFor(counts, target.subject, target.subjectId);
  const tone = count.high
    ? "border-caution bg-caution text-surface"
    : count.open
      ? "border-accent bg-accent text-accent-ink"
      : "border-line text-muted hover:text-ink";
  return (
    <>
      <button
        type="button"
        aria-label={noteCountLabel(count, target.label)}
        aria-haspopup="dialog"
        aria-expanded={open}
        data-testid="notes-button"
        data-note-count={count.open}
        onClick={(e) => {
          e.stopPropagation();
          setOpen(true);
        }}
        data-cell-control={cellControl ? "" : undefined}
        // A row that acts on Enter or Space (the cue list) must not take the button's own press; arrows still move.
        onKeyDown={(e) => (e.key === "Enter" || e.key === " ") && e.stopPropagation()}
        className={`inline-flex min-h-7 min-w-7 items-center justify-center gap-1 rounded-full border px-1.5 text-xs font-semibold tabular-nums pointer-coarse:min-h-11 pointer-coarse:min-w-11 print:hidden ${tone} ${className}`}
      >
        {compact
          ? count.open
            ? count.open
            : "+"
          : count.open
            ? `${count.open} note${count.open === 1 ? "" : "s"}`
            : "Notes"}
      </button>
      {open ? (
        <TargetNotesDialog
          productionId={productionId}
          target={target}
          defaultKind={defaultKind ?? DEFAULT_KIND[target.subject]}
          onClose={() => setOpen(false)}
        />
      ) : null}
    </>
  );
}

/** What a note on each kind of thing most often is (the quick form starts there; the person may change it). */
const DEFAULT_KIND: Record<NoteTarget["subject"], NoteKind> = {
  fixture: "work",
  position: "work",
  cue: "cue",
  focus_point: "focus",
};
