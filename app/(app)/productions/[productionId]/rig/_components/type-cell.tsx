"use client";

import { useRef, useState } from "react";
import type { FixtureTypeDto } from "@/lib/dto/fixture-type";
import { parseTypeCell, typeCellText, type TypeColumn } from "@/lib/rig/type-fields";
import type { Units } from "@/lib/rig/columns";
import { ApiError } from "@/lib/http/api-client";
import { useUpdateFixtureType } from "@/hooks/use-rig";
import { EDITABLE_FIELD, READ_ONLY_VALUE } from "@/components/ui/field-look";

/**
 * One figure of a fixture type: plain text for a role that may not change it, else a button that opens
 * an input. Checked as typed; saved with the type's version; a stale version shows the current figure.
 */
export function TypeCell({
  productionId,
  type,
  column,
  units,
  editable,
}: {
  productionId: number;
  type: FixtureTypeDto;
  column: TypeColumn;
  units: Units;
  editable: boolean;
}) {
  const update = useUpdateFixtureType(productionId);
  const [editing, setEditing] = useState(false);
  const [text, setText] = useState("");
  const [message, setMessage] = useState<{ tone: "error" | "conflict"; text: string } | null>(null);
  const closing = useRef(false); // Enter closes the input, and its blur must not save a second time
  const shown = typeCellText(type, column, units);
  const label = `${column.header} of ${type.name}`;

  const note = message ? (
    <span
      role={message.tone === "error" ? "alert" : "status"}
      className={`block max-w-56 whitespace-normal text-xs ${message.tone === "error" ? "text-danger" : "text-caution"}`}
      data-testid="type-cell-message"
    >
      {message.text}
    </span>
  ) : null;

  async function commit(typed = text) {
    if (closing.current) return;
    if (typed === shown) return setEditing(false);
    const parsed = parseTypeCell(column, typed, units, type);
    if (!parsed.ok) return setMessage({ tone: "error", text: parsed.message });
    closing.current = true;
    setEditing(false);
    try {
      await update.mutateAsync({ id: type.id, patch: { ...parsed.patch, version: type.version } });
      setMessage(null);
    } catch (err) {
      if (err instanceof ApiError && err.status === 409 && err.current) {
        setMessage({
          tone: "conflict",
          text: `Someone else changed this type first; it is now ${typeCellText(err.current as FixtureTypeDto, column, units) || "empty"}. Your edit was not saved.`,
        });
      } else
        setMessage({
          tone: "error",
          text: err instanceof ApiError ? (Object.values(err.fieldErrors)[0]?.[0] ?? err.message) : "Could not save.",
        });
    }
  }

  if (!editable)
    return (
      <span className={READ_ONLY_VALUE} data-readonly="true">
        {shown || "—"}
      </span>
    );
  if (!editing) {
    return (
      <span>
        <button
          type="button"
          aria-label={`Edit ${label}`}
          className={`min-h-7 w-full min-w-10 text-left ${EDITABLE_FIELD}`}
          onClick={() => {
            closing.current = false;
            setText(shown);
            setEditing(true);
            setMessage(null);
          }}
        >
          {shown || <span className="text-muted">–</span>}
        </button>
        {note}
      </span>
    );
  }
  if (column.kind === "choice") {
    return (
      <span>
        <select
          autoFocus
          aria-label={label}
          className="min-h-8 w-full min-w-32 rounded border border-accent bg-surface px-1"
          value={text}
          onChange={(e) => {
            setText(e.target.value);
            void commit(e.target.value);
          }}
          onBlur={() => setEditing(false)}
          onKeyDown={(e) => {
            if (e.key === "Escape") setEditing(false);
          }}
        >
          {(column.choices ?? []).map((c) => (
            <option key={c.value} value={c.label}>
              {c.label}
            </option>
          ))}
        </select>
        {note}
      </span>
    );
  }
  return (
    <span>
      <input
        autoFocus
        aria-label={label}
        aria-invalid={message?.tone === "error" || undefined}
        className="w-full min-w-16 rounded border border-accent bg-surface px-1 aria-invalid:border-danger"
        value={text}
        onChange={(e) => setText(e.target.value)}
        onBlur={() => void commit()}
        onKeyDown={(e) => {
          if (e.key === "Escape") {
            setEditing(false);
            setMessage(null);
          }
          if (e.key === "Enter") void commit();
        }}
      />
      {note}
    </span>
  );
}
