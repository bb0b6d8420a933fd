"use client";

import { useEffect, useState } from "react";
import { EDITABLE_FIELD, READ_ONLY_VALUE } from "@/components/ui/field-look";

/**
 * A cell the stage manager can type into; saves on Enter or when leaving the field. It looks like a
 * field (outline, focus ring) only for a role that may change it; for anyone else it is plain text.
 */
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
  if (!editable)
    return (
      <span className={`whitespace-pre-wrap ${READ_ONLY_VALUE}`} data-readonly="true">
        {value}
      </span>
    );
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
        className={`no-print min-h-9 ${EDITABLE_FIELD} ${narrow ? "w-16 tabular-nums" : "w-full min-w-40"}`}
      />
      <span className="hidden whitespace-pre-wrap print:inline">{value}</span>
    </>
  );
}
