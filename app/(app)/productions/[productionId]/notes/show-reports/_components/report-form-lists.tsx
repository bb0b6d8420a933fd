"use client";
// The show-report form's two lists: lighting items (each a note once sent) and the lamp-out and fault log.
import type { ReactNode } from "react";
import { Button } from "@/components/ui/button";
import { KIND_LABELS } from "@/lib/notes/words";
import { NOTE_KINDS, type NoteKind } from "@/models/note-vocabulary";
import type { Item } from "./report-items";

export type Fault = { fixtureId: string; kind: "lamp_out" | "fault"; description: string };
type UnitSelect = (value: string, onChange: (v: string) => void, label: string) => ReactNode;
const input = "rounded border border-line bg-raised px-2 py-1";

export function ItemsFieldset({
  items,
  setItems,
  unitSelect,
}: {
  items: Item[];
  setItems: (items: Item[]) => void;
  unitSelect: UnitSelect;
}) {
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="font-medium">Lighting items (each becomes a note for whoever does that kind of job)</legend>
      {items.map((it, i) => (
        <div key={i} className="flex flex-wrap items-end gap-2">
          <label className="flex flex-1 flex-col gap-1">
            Item {i + 1}
            <input
              className={input}
              value={it.body}
              onChange={(e) => setItems(items.map((x, j) => (j === i ? { ...x, body: e.target.value } : x)))}
            />
          </label>
          <label className="flex flex-col gap-1">
            Kind
            <select
              className={input}
              value={it.kind}
              onChange={(e) =>
                setItems(items.map((x, j) => (j === i ? { ...x, kind: e.target.value as NoteKind } : x)))
              }
            >
              {NOTE_KINDS.map((k) => (
                <option key={k} value={k}>
                  {KIND_LABELS[k]}
                </option>
              ))}
            </select>
          </label>
          {unitSelect(
            it.fixtureId,
            (v) =>
              setItems(
                items.map((x, j) =>
                  j === i ? { ...x, fixtureId: v, subject: v ? "fixture" : "production", subjectId: null } : x,
                ),
              ),
            "Unit",
          )}
          <Button type="button" variant="quiet" onClick={() => setItems(items.filter((_, j) => j !== i))}>
            Remove
          </Button>
        </div>
      ))}
      <Button
        type="button"
        variant="secondary"
        onClick={() => setItems([...items, { body: "", kind: "work", fixtureId: "" }])}
      >
        Add a lighting item
      </Button>
    </fieldset>
  );
}

export function FaultsFieldset({
  faults,
  setFaults,
  unitSelect,
}: {
  faults: Fault[];
  setFaults: (faults: Fault[]) => void;
  unitSelect: UnitSelect;
}) {
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="font-medium">Lamp-out and fault log (a logged unit gets a work note)</legend>
      {faults.map((f, i) => (
        <div key={i} className="flex flex-wrap items-end gap-2">
          {unitSelect(
            f.fixtureId,
            (v) => setFaults(faults.map((x, j) => (j === i ? { ...x, fixtureId: v } : x))),
            `Entry ${i + 1}: unit`,
          )}
          <label className="flex flex-col gap-1">
            What
            <select
              className={input}
              value={f.kind}
              onChange={(e) =>
                setFaults(faults.map((x, j) => (j === i ? { ...x, kind: e.target.value as Fault["kind"] } : x)))
              }
            >
              <option value="lamp_out">Lamp out</option>
              <option value="fault">Fault</option>
            </select>
          </label>
          <label className="flex flex-1 flex-col gap-1">
            Seen
            <input
              className={input}
              value={f.description}
              maxLength={300}
              onChange={(e) => setFaults(faults.map((x, j) => (j === i ? { ...x, description: e.target.value } : x)))}
            />
          </label>
          <Button type="button" variant="quiet" onClick={() => setFaults(faults.filter((_, j) => j !== i))}>
            Remove
          </Button>
        </div>
      ))}
      <Button
        type="button"
        variant="secondary"
        onClick={() => setFaults([...faults, { fixtureId: "", kind: "lamp_out", description: "" }])}
      >
        Log a lamp out or fault
      </Button>
    </fieldset>
  );
}
