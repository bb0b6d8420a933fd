"use client";

import { type ReactNode, useId, useState } from "react";

/**
 * Extra words about something shown (a channel's purposes, a cut-short note) that a tap, a click or Enter
 * opens and Escape, a second tap or moving on closes: a tablet has no hover, so nothing hides behind a
 * tooltip. The words are also the button's description, so a screen reader hears them without opening it.
 */
export function TapHint({
  hint,
  children,
  className = "",
  testId,
  compact = false,
}: {
  hint: string;
  /** Inside a grid of fixed-height rows (the level grid): no taller touch box than the row itself. */
  compact?: boolean;
  children: ReactNode;
  className?: string;
  testId?: string;
}) {
  const [open, setOpen] = useState(false);
  const id = useId();
  return (
    <span
      className="relative inline-flex max-w-full"
      onKeyDown={(e) => {
        if (e.key === "Escape" && open) {
          e.stopPropagation();
          setOpen(false);
        }
      }}
      onBlur={(e) => {
        if (!e.currentTarget.contains(e.relatedTarget as Node | null)) setOpen(false);
      }}
    >
      <button
        type="button"
        aria-expanded={open}
        aria-describedby={id}
        onClick={() => setOpen((o) => !o)}
        className={`min-w-0 cursor-help rounded text-left underline decoration-dotted underline-offset-2 ${compact ? "" : "pointer-coarse:min-h-11"} ${className}`}
        data-testid={testId}
      >
        {children}
      </button>
      <span
        id={id}
        role="note"
        hidden={!open}
        className="absolute left-0 top-full z-30 mt-1 w-max max-w-72 whitespace-pre-wrap rounded-md border border-line bg-raised p-2 text-xs font-normal normal-case text-ink shadow-lg"
      >
        {hint}
      </span>
    </span>
  );
}
