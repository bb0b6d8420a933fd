"use client";

import { useEffect, useId, useRef, useState } from "react";
import type { FixtureDto } from "@/lib/dto/fixture";
import { fixtureFieldsSchema } from "@/lib/validation/fixture";
import type { RigColumn, Units } from "@/lib/rig/columns";
import { ApiError } from "@/lib/http/api-client";
import { useUpdateRigFixture } from "@/hooks/use-rig";
import { editText, readTyped, showValue } from "./cell-value";
import { EmptyOrInherited } from "./inherited-value";

export type Choice = { id: number; name: string };

/**
 * A table cell the signed-in role may edit. Validated as typed (the API's own field schema), saved
 * with the row's version; a stale version shows the other person's value instead of overwriting it.
 */
export function EditableCell({
  fixture,
  column,
  units,
  productionId,
  choices,
}: {
  fixture: FixtureDto;
  column: RigColumn;
  units: Units;
  productionId: number;
  choices?: Choice[];
}) {
  const attr = column.attribute ?? column.id;
  const update = useUpdateRigFixture(productionId);
  const [editing, setEditing] = useState(false);
  const [text, setText] = useState("");
  const [message, setMessage] = useState<{ tone: "error" | "conflict"; text: string } | null>(null);
  const value = column.value(fixture);
  const unit = `unit ${fixture.unitNumber} on ${fixture.positionName}`;
  const label = `${column.header} of ${unit}`;
  const shown = showValue(column.kind, value, units);
  // Focus goes back to the cell's button after Enter or Escape (not after a tap elsewhere, which moved it on purpose).
  const noteId = useId();
  const cellButton = useRef<HTMLButtonElement>(null);
  const refocus = useRef(false);
  useEffect(() => {
    if (!editing && refocus.current) {
      refocus.current = false;
      cellButton.current?.focus();
    }
  }, [editing]);

  async function save(next: unknown) {
    const schema = (
      fixtureFieldsSchema.shape as Record<
        string,
        { safeParse: (v: unknown) => { success: boolean; error?: { issues: Array<{ message: string }> } } }
      >
    )[attr];
    const checked = schema.safeParse(next);
    if (!checked.success) {
      refocus.current = false;
      return setMessage({ tone: "error", text: checked.error!.issues[0].message });
    }
    setEditing(false);
    try {
      await update.mutateAsync({ id: fixture.id, patch: { version: fixture.version, [attr]: next } });
      setMessage(null);
    } catch (err) {
      if (err instanceof ApiError && err.status === 409) {
        const current = (err.current as Record<string, unknown> | undefined)?.[attr];
        setMessage({
          tone: "conflict",
          text: `Someone else changed this first; it is now ${current === null || current === undefined || current === "" ? "empty" : showValue(column.kind, current, units)}. Your edit was not saved.`,
        });
      } else
        setMessage({
          tone: "error",
          text: err instanceof ApiError ? (err.fieldErrors[attr]?.[0] ?? err.message) : "Could not save.",
        });
    }
  }

  const note = message ? (
    <span
      id={noteId}
      role={message.tone === "error" ? "alert" : "status"}
      className={`block max-w-56 whitespace-normal text-xs ${message.tone === "error" ? "text-danger" : "text-caution"}`}
      data-testid="cell-message"
    >
      {message.text}
    </span>
  ) : null;

  if (column.kind === "bool") {
    return (
      <label className="flex min-h-8 min-w-11 cursor-pointer items-center gap-1 px-2 pointer-coarse:min-h-11">
        <input
          type="checkbox"
          data-cell-control
          aria-label={`${column.header}, ${unit}`}
          checked={Boolean(value)}
          disabled={update.isPending}
          onChange={(e) => save(e.target.checked)}
        />
        {note}
      </label>
    );
  }
  if (choices || column.id === "aim") {
    const options = choices ?? [
      { id: 0, name: "deck" },
      { id: 1, name: "head" },
    ];
    const current = choices ? (fixture as unknown as Record<string, number>)[attr] : value;
    return (
      <span>
        <select
          data-cell-control
          aria-label={`${column.header}, ${unit}`}
          className="min-h-8 max-w-44 rounded border border-line/70 bg-transparent px-1 py-0.5 hover:border-field pointer-coarse:min-h-11 print:appearance-none print:border-0"
          value={String(current)}
          disabled={update.isPending}
          onChange={(e) => save(choices ? Number(e.target.value) : e.target.value)}
        >
          {options.map((o) => (
            <option key={o.id} value={choices ? o.id : o.name}>
              {o.name}
            </option>
          ))}
        </select>
        {note}
      </span>
    );
  }
  if (!editing) {
    return (
      <span>
        {/* The name carries the value shown ("Circuit 101, unit 1 on FOH Bridge 2, edit"); the button fills the
            cell, so a tap anywhere in it edits, with a faint underline that says "editable" without hover. */}
        <button
          ref={cellButton}
          type="button"
          data-cell-control
          aria-label={`${column.header} ${shown || "empty"}, ${unit}, edit`}
          className="min-h-8 w-full min-w-11 rounded px-2 text-left underline decoration-field/60 decoration-dotted underline-offset-4 hover:bg-raised pointer-coarse:min-h-11 print:no-underline"
          onClick={() => {
            setText(editText(column.kind, value, units));
            setEditing(true);
            setMessage(null);
          }}
        >
          {shown || <EmptyOrInherited column={column} fixture={fixture} units={units} />}
        </button>
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
        aria-describedby={message ? noteId : undefined}
        className="min-h-8 w-full min-w-16 rounded border border-accent bg-surface px-2 aria-invalid:border-danger pointer-coarse:min-h-11"
        value={text}
        onChange={(e) => setText(e.target.value)}
        onKeyDown={(e) => {
          if (e.key === "Escape") {
            refocus.current = true;
            setEditing(false);
            setMessage(null);
          }
          // preventDefault: otherwise the Enter's keypress lands on the cell's button, now focused again, and reopens the editor.
          if (e.key === "Enter") {
            e.preventDefault();
            refocus.current = true;
            commit();
          }
        }}
        onBlur={() => commit()}
      />
      {note}
    </span>
  );

  function commit() {
    let next: unknown;
    try {
      next = readTyped(column.kind, text, units);
    } catch (err) {
      refocus.current = false;
      return setMessage({ tone: "error", text: (err as Error).message });
    }
    if (next === value || (next === null && (value === null || value === ""))) return setEditing(false);
    void save(next);
  }
}
