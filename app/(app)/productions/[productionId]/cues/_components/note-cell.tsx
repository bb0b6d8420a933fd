"use client";

import { useEffect, useState } from "react";

/** A cell the stage manager can type into; saves on Enter or when leaving the field. Read-only otherwise. */
export function NoteCell({
  value,
  editable,
  label,
  narrow,
  onSave,
}: {
  value: string | null;
  editable: boolean;
  label: string;
  narrow?: boolean;
  onSave: (v: string) => void;
}) {
  const [draft, setDraft] = useState(value ?? "");
  useEffect(() => setDraft(value ?? ""), [value]);
  if (!editable) return <span className="whitespace-pre-wrap">{value}</span>;
  return (
    <>
      <input
        aria-label={label}
        value={draft}
        onChange={(e) => setDraft(e.target.value)}
        onBlur={() => onSave(draft)}
        onKeyDown={(e) => {
          if (e.key === "Enter") e.currentTarget.blur();
          if (e.key === "Escape") setDraft(value ?? "");
        }}
        className={`no-print min-h-9 rounded border border-transparent bg-transparent px-1 hover:border-line focus:border-accent ${narrow ? "w-16" : "w-full min-w-40"}`}
      />
      <span className="hidden whitespace-pre-wrap print:inline">{value}</span>
    </>
  );
}
