"use client";

import type { VisibilityState } from "@tanstack/react-table";
import { RIG_COLUMNS } from "@/lib/rig/columns";

export function ColumnChooser({
  visibility,
  onChange,
}: {
  visibility: VisibilityState;
  onChange: (v: VisibilityState) => void;
}) {
  const shown = RIG_COLUMNS.filter((c) => visibility[c.id] !== false).length;
  return (
    <details className="relative">
      <summary className="inline-flex min-h-10 cursor-pointer items-center rounded-md border border-line bg-surface px-3 text-sm hover:bg-raised">
        Columns ({shown})
      </summary>
      <fieldset className="absolute z-20 mt-1 grid max-h-96 w-72 grid-cols-2 gap-1 overflow-y-auto rounded-md border border-line bg-surface p-3 text-sm shadow-lg">
        <legend className="sr-only">Columns to show</legend>
        {RIG_COLUMNS.map((c) => (
          <label key={c.id} className="flex items-center gap-1">
            <input
              type="checkbox"
              checked={visibility[c.id] !== false}
              onChange={(e) => onChange({ ...visibility, [c.id]: e.target.checked })}
            />
            <span className={c.importKey ? "" : "italic"}>{c.header}</span>
          </label>
        ))}
      </fieldset>
    </details>
  );
}
